/**
 * Steady state of a single catalytic cycle from its rate constants alone, by the
 * matrix-tree (King–Altman) theorem: p_j is proportional to the sum over spanning trees
 * directed to state j of the products of their rate constants (King & Altman, J. Phys. Chem.
 * 60, 1375 (1956), from memory; Christiansen, Adv. Catal. 5, 311 (1953)). For a ring the trees
 * are the ring less one edge, so every term is a positive product: no cancellation, unlike a
 * dense solve of the stiff master equation. kPlus[i] takes I_i → I_{i+1}, kMinus[i] the
 * reverse, indices cyclic. The net flux is read at the step with the largest forward/backward
 * ratio, where it cancels least. O(N³); for small test cycles.
 */
export function cycleSteadyState(kPlus: number[], kMinus: number[]): { populations: number[]; tof: number } {
  const n = kPlus.length;
  const weights = Array.from({ length: n }, (_, j) => {
    let sum = 0;
    for (let cut = 0; cut < n; cut++) {
      const d = (cut - j + n) % n;
      let product = 1;
      // states clockwise from j before the cut edge flow back to j, the rest flow forward to it.
      for (let k = 1; k < n; k++) {
        const s = (j + k) % n;
        product *= k <= d ? kMinus[(s - 1 + n) % n]! : kPlus[s]!;
      }
      sum += product;
    }
    return sum;
  });
  const total = weights.reduce((a, b) => a + b, 0);
  const populations = weights.map((w) => w / total);
  let best = { ratio: -Infinity, net: 0 };
  for (let j = 0; j < n; j++) {
    const forward = kPlus[j]! * populations[j]!;
    const backward = kMinus[j]! * populations[(j + 1) % n]!;
    if (forward / backward > best.ratio) best = { ratio: forward / backward, net: forward - backward };
  }
  return { populations, tof: best.net };
}
