/**
 * A basis of the linear conservation laws of a reaction network: vectors w (one entry per
 * species) with w·ν_r = 0 for every reaction's net change ν_r, i.e. the left null space of
 * the stoichiometric matrix (Famili & Palsson, Biophys. J. 85, 16 (2003) [from memory]).
 * Gauss–Jordan elimination with partial pivoting on the reactions × species matrix; entries
 * below `tolerance` times the largest count count as zero (counts are small integers).
 */
export function conservationLaws(netChanges: readonly ArrayLike<number>[], speciesCount: number, tolerance = 1e-9): Float64Array[] {
  const rows = netChanges.map((v) => Float64Array.from({ length: speciesCount }, (_, i) => v[i] ?? 0));
  const pivotColumns: number[] = [];
  let r = 0;
  for (let c = 0; c < speciesCount && r < rows.length; c++) {
    let p = r;
    for (let i = r + 1; i < rows.length; i++) if (Math.abs(rows[i]![c]!) > Math.abs(rows[p]![c]!)) p = i;
    if (Math.abs(rows[p]![c]!) <= tolerance) continue;
    [rows[r], rows[p]] = [rows[p]!, rows[r]!];
    const pivot = rows[r]!;
    const scale = pivot[c]!;
    for (let j = 0; j < speciesCount; j++) pivot[j]! /= scale;
    for (let i = 0; i < rows.length; i++) {
      if (i === r) continue;
      const f = rows[i]![c]!;
      if (f !== 0) for (let j = 0; j < speciesCount; j++) rows[i]![j]! -= f * pivot[j]!;
    }
    pivotColumns.push(c);
    r++;
  }
  const free = [...Array(speciesCount).keys()].filter((c) => !pivotColumns.includes(c));
  return free.map((f) => {
    const w = new Float64Array(speciesCount);
    w[f] = 1;
    pivotColumns.forEach((c, k) => { w[c] = -rows[k]![f]!; });
    return w;
  });
}
