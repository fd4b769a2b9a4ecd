/**
 * Kinetics of a resolved profile: Eyring rates, steps, effective barrier, energetic span,
 * comparisons and temperature scans. Energies in J/mol, rates in SI (M-based for m > 1).
 */
export * from './types.ts';
export * from './conditions.ts';
export * from './eyring.ts';
export * from './steps.ts';
export * from './stepTopEnergy.ts';
export * from './stepKinetics.ts';
export * from './effectiveBarrier.ts';
export * from './feasibilityReading.ts';
export * from './logSumExp.ts';
export * from './cycleStates.ts';
export * from './spanSums.ts';
export * from './energeticSpan.ts';
export * from './selectivity.ts';
export * from './productDistribution.ts';
export * from './compare.ts';
export * from './pathwayAtTemperature.ts';
export * from './temperatureScan.ts';
