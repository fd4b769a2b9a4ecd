/**
 * Keeps a state physical (for the components flagged in `mask`): components below zero by less than their error scale
 * (atol + rtol·|y|) are set to 0; returns false when one is more negative than that,
 * so the caller rejects the step and retries with a smaller one (common practice in
 * chemical-kinetics integrators; the clipped amount is within the requested tolerance).
 */
export function clipNegatives(yNew: Float64Array, yOld: Float64Array, rtol: number, atol: Float64Array, mask: Uint8Array): boolean {
  for (let i = 0; i < yNew.length; i++) {
    const v = yNew[i]!;
    if (mask[i] && v < 0 && -v > atol[i]! + rtol * Math.abs(yOld[i]!)) return false;
  }
  for (let i = 0; i < yNew.length; i++) if (mask[i] && yNew[i]! < 0) yNew[i] = 0;
  return true;
}
