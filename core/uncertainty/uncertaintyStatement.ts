import { sigmaUnitLabel } from './uncertainInputs.ts';
import type { ReportUncertainty } from './annotateReport.ts';

/** "σ" of one input as entered, e.g. "1 kcal mol⁻¹". */
export function sigmaText(input: ReportUncertainty['inputs'][number]): string {
  return `${input.sigma} ${sigmaUnitLabel(input.unit)}`;
}

/**
 * What every output of a Monte Carlo run states: how it was run (N, seed, what the interval
 * is) and each input's σ as entered, marked where it is the document's default.
 */
export function uncertaintyStatement(u: ReportUncertainty): { run: string; inputs: string } {
  return {
    run: `${u.method}; N = ${u.samples} samples, seed ${u.seed}; ${u.interval}`,
    inputs: u.inputs.length === 0
      ? 'no input carries a σ: give "sigma" beside an entered value, or a default σ in settings.uncertainty.defaultSigma'
      : u.inputs.map((i) => `${i.input} ${sigmaText(i)}${i.default ? ' (default)' : ''}`).join('; '),
  };
}
