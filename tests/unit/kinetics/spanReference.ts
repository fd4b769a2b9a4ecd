/**
 * Naive O(N²) energetic span reference for tests, written straight from the compact form in
 * REFERENCE.md §6 (Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011)): every δE_ij is formed,
 * then summed after subtracting the largest (so it does not overflow). `rule` chooses when
 * TS i counts as after intermediate j; 'i>=j' is the correct one, the others are the wrong
 * conventions REFERENCE.md §6 warns about.
 */
export type SpanRule = 'i>=j' | 'i>j' | 'wrong-side';

const R = 8.31446261815324; // J/(mol K), REFERENCE.md §1 (CODATA 2018, exact)
const KB_H = 2.083661912332757e10; // s⁻¹ K⁻¹, REFERENCE.md §1 (exact)

export function naiveSpan(ints: number[], tss: number[], reactionEnergyJ: number, temperatureK: number, rule: SpanRule = 'i>=j') {
  const rt = R * temperatureK;
  const n = ints.length;
  const after = (i: number, j: number) => (rule === 'i>=j' ? i >= j : rule === 'i>j' ? i > j : i <= j);
  const d = (i: number, j: number) => tss[i]! - ints[j]! + (after(i, j) ? 0 : reactionEnergyJ);
  // Two streaming passes (largest δE, then the shifted sums) keep memory O(N) for big cycles.
  let top = -Infinity;
  let best = { i: 0, j: 0 };
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (d(i, j) > top) { top = d(i, j); best = { i, j }; }
  const xTs = new Array<number>(n).fill(0);
  const xInt = new Array<number>(n).fill(0);
  let total = 0;
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
    const w = Math.exp((d(i, j) - top) / rt);
    xTs[i] = xTs[i]! + w;
    xInt[j] = xInt[j]! + w;
    total += w;
  }
  const logTof = Math.log(KB_H * temperatureK) + Math.log(-Math.expm1(reactionEnergyJ / rt)) - top / rt - Math.log(total);
  return {
    tof: Math.exp(logTof),
    logTof,
    deltaEJ: top,
    best,
    xTs: xTs.map((x) => x / total),
    xInt: xInt.map((x) => x / total),
  };
}
