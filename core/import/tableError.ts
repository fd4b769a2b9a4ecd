/** A problem in an imported table, located by row (line number) and column header. */
export interface TableError {
  row: number;
  /** Header text of the column ("G [kcal/mol]"), or its number when there is no header. */
  column: string;
  value: string;
  message: string;
}
