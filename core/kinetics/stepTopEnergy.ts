/**
 * The energy a step's rates pass over, in J/mol: its transition state, or the higher of its
 * two minima when the TS lies below one of them or when there is no TS (two minima in a row).
 * A TS drawn below a neighbouring minimum is usually an artefact — single points at a
 * different level of theory than the geometries, a missing lower conformer of the minimum —
 * and taken literally it would give k > κk_BT/h; treating the step as barrierless instead is
 * common practice. Step rates, energetic span input and microkinetic networks all use this.
 */
export function stepTopEnergy(fromJ: number, tsJ: number | null, toJ: number): number {
  const higherMinimum = Math.max(fromJ, toJ);
  return tsJ === null || tsJ < higherMinimum ? higherMinimum : tsJ;
}
