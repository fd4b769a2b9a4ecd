// The log-sum-exp helpers live beside the Boltzmann ensemble in core/thermo; the span sums use them from here.
/** ln(e^a + e^b), prefix and suffix log-sums: core/thermo's log-sum-exp helpers. */
export { logAddExp, prefixLogSumExp, suffixLogSumExp } from '../thermo/logSumExp.ts';
