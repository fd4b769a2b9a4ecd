/** Rounds to 8 significant digits for CSV output (well beyond the accuracy of any input energy). */
export function significant(value: number): number {
  return Number(value.toPrecision(8));
}
