/** How much of a result's spread one input explains. */
export interface VarianceShare {
  key: string;
  label: string;
  /** r², squared correlation of the input's deviate with the result, in [0, 1]. */
  share: number;
}

/**
 * First-order variance shares of `target` over independent inputs: the squared correlation
 * r_i² of each input's standard deviate z_i with the target, which for independent inputs
 * equals the squared standardised regression coefficient; Σ r_i² is the R² of the linear
 * model (Saltelli et al., Global Sensitivity Analysis: The Primer, Wiley 2008, §1.2; citation
 * from memory, tests/REFERENCES.md §12). `z` holds the deviates sample-major: z[s·m + i]. Samples with a non-finite target
 * are left out. Sorted, largest first.
 */
export function varianceShares(target: Float64Array, z: Float64Array, inputs: readonly { key: string; label: string }[]): VarianceShare[] {
  const m = inputs.length;
  const keep: number[] = [];
  for (let s = 0; s < target.length; s++) if (Number.isFinite(target[s]!)) keep.push(s);
  const n = keep.length;
  if (n < 3 || m === 0) return [];
  let mean = 0;
  for (const s of keep) mean += target[s]!;
  mean /= n;
  let syy = 0;
  for (const s of keep) syy += (target[s]! - mean) ** 2;
  const out: VarianceShare[] = inputs.map((input, i) => {
    let zm = 0;
    for (const s of keep) zm += z[s * m + i]!;
    zm /= n;
    let sxy = 0, sxx = 0;
    for (const s of keep) { const dz = z[s * m + i]! - zm; sxy += dz * (target[s]! - mean); sxx += dz * dz; }
    const share = syy > 0 && sxx > 0 ? (sxy * sxy) / (sxx * syy) : 0;
    return { key: input.key, label: input.label, share };
  });
  return out.sort((a, b) => b.share - a.share);
}
