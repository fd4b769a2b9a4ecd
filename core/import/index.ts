export { importTable, type TableError, type TableImport } from './table.ts';
export { readDelimited, readNumber } from './delimited.ts';
export * from './calc/index.ts';
