/**
 * The scale a raw point energy lives on. Typed values are already relative; species
 * sums are absolute electronic-structure energies; formation sums are Hess-law values.
 * Only energies on the same scale can be subtracted.
 */
export type Scale = 'relative' | 'absolute' | 'formation';

/** A point's energy before referencing, in J/mol, with its scale. */
export interface RawEnergy {
  valueJ: number | null;
  scale: Scale;
}
