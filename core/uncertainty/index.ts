export { analyseUncertainty, startUncertainty, DEFAULT_SAMPLES, DEFAULT_SEED } from './uncertaintyRun.ts';
export type { UncertaintyResult, UncertaintyRun, UncertaintyOptions, QuantityResult, ChoiceResult, RateSensitivity } from './uncertaintyRun.ts';
export { uncertainInputs, describeSigma, sigmaUnitLabel, type UncertainInput, type InputTarget } from './uncertainInputs.ts';
export { perturbDocument, logNormalShift } from './perturbDocument.ts';
export { summarise, frequencies, type Interval } from './summarise.ts';
export { varianceShares, type VarianceShare } from './varianceShares.ts';
export { normalSampler } from './normalSampler.ts';
