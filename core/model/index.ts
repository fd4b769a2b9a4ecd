export * from './schema.ts';
export * from './load.ts';
export { migrate } from './migrate.ts';
export { pointComposition } from './composition.ts';
