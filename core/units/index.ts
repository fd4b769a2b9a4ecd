export * from './constants.ts';
export * from './energy.ts';
export * from './thermal.ts';
