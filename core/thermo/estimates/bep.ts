/** A Bell–Evans–Polanyi estimate, J/mol, with its warning flags. */
export interface BepEstimate {
  barrierJ: number;
  /** α outside [0, 1] leaves the range where the relation is meant to hold. */
  alphaOutOfRange: boolean;
  /** The estimate lies below max(0, ΔH): a barrier cannot be lower than the step's own endothermicity (common practice check). */
  belowThermodynamicLimit: boolean;
}

/**
 * Bell–Evans–Polanyi barrier E_a = E₀ + αΔH for a member of one reaction family, J/mol
 * (Bell, Proc. R. Soc. Lond. A 154, 414 (1936); Evans & Polanyi, Trans. Faraday Soc. 34, 11 (1938)).
 */
export function bepBarrier(e0J: number, alpha: number, deltaHJ: number): BepEstimate {
  const barrierJ = e0J + alpha * deltaHJ;
  return { barrierJ, alphaOutOfRange: alpha < 0 || alpha > 1, belowThermodynamicLimit: barrierJ < Math.max(0, deltaHJ) };
}

/** α and E₀ (J/mol) of the BEP line through two family members (ΔH, E_a); null if ΔH are equal. */
export function bepFromPair(a: { deltaHJ: number; barrierJ: number }, b: { deltaHJ: number; barrierJ: number }): { alpha: number; e0J: number } | null {
  if (a.deltaHJ === b.deltaHJ) return null;
  const alpha = (b.barrierJ - a.barrierJ) / (b.deltaHJ - a.deltaHJ);
  return { alpha, e0J: a.barrierJ - alpha * a.deltaHJ };
}
