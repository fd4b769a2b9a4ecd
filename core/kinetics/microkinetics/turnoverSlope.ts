/**
 * Long-time slope of a cumulative turnover count: (N(t₁) − N(t₀))/(t₁ − t₀) per unit of
 * catalyst. At steady state the count grows linearly and the slope is the TOF, the way a
 * turnover frequency is read from an integrated master equation (Kozuch & Shaik, Acc. Chem.
 * Res. 44, 101 (2011); REFERENCE.md §6, method (c)).
 */
export function turnoverSlope(t0: number, n0: number, t1: number, n1: number, catalystTotal: number): number {
  return (n1 - n0) / (t1 - t0) / catalystTotal;
}
