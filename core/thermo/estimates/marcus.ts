/** A Marcus barrier estimate, J/mol. */
export interface MarcusEstimate {
  barrierJ: number;
  /** Leffler/Brønsted slope α = ∂Δ‡G/∂ΔG° = ½(1 + ΔG°/λ): 0.5 at ΔG° = 0, below 0 when inverted. */
  alpha: number;
  /** True in the Marcus inverted region (ΔG° < −λ), where the barrier rises again. */
  inverted: boolean;
}

/**
 * Marcus barrier Δ‡G = (λ/4)(1 + ΔG°/λ)² from the reaction free energy ΔG° and the
 * reorganisation energy λ > 0, both J/mol (R. A. Marcus, J. Chem. Phys. 24, 966 (1956);
 * IUPAC Gold Book 'Marcus equation'; Leffler, Science 117, 340 (1953) for α).
 */
export function marcusBarrier(deltaG0J: number, lambdaJ: number): MarcusEstimate {
  if (!(lambdaJ > 0) || !Number.isFinite(lambdaJ)) throw new RangeError(`λ must be positive and finite, got ${lambdaJ}`);
  const x = 1 + deltaG0J / lambdaJ;
  return { barrierJ: (lambdaJ / 4) * x * x, alpha: x / 2, inverted: deltaG0J < -lambdaJ };
}
