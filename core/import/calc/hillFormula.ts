import type { CalcAtom } from './calcRecord.ts';

/**
 * Hill-order formula of a geometry: C first, then H, then the rest alphabetically; without
 * carbon, all alphabetically (E. A. Hill, J. Am. Chem. Soc. 22, 478 (1900); the order used by
 * CAS and the NIST WebBook).
 */
export function hillFormula(atoms: readonly Pick<CalcAtom, 'symbol'>[]): string {
  const counts = new Map<string, number>();
  for (const { symbol } of atoms) counts.set(symbol, (counts.get(symbol) ?? 0) + 1);
  const symbols = [...counts.keys()].sort();
  const order = counts.has('C') ? ['C', ...(counts.has('H') ? ['H'] : []), ...symbols.filter((s) => s !== 'C' && s !== 'H')] : symbols;
  return order.map((s) => `${s}${counts.get(s) === 1 ? '' : counts.get(s)}`).join('');
}
