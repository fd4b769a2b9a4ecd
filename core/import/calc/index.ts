export * from './calcRecord.ts';
export { readGaussianLog } from './readGaussianLog.ts';
export { readOrcaOutput } from './readOrcaOutput.ts';
export { readXyz, type XyzResult } from './readXyz.ts';
export { readCalculation, detectProgram, type CalcReading } from './readCalculation.ts';
export { hillFormula } from './hillFormula.ts';
export { pairCalcFiles, speciesKey, type CalcFile, type CalcPair } from './pairCalcFiles.ts';
export { speciesFromCalc, type CalcConditions, type SpeciesCandidate } from './speciesFromCalc.ts';
export { importCalculations, type CalcImport } from './importCalculations.ts';
