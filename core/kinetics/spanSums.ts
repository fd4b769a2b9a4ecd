import { logAddExp, prefixLogSumExp, suffixLogSumExp } from './logSumExp.ts';

/** Log-space sums of the span matrix Σ_ij e^{δE_ij/RT}, by row (TS) and by column (intermediate). */
export interface SpanSums {
  /** ln Σ_ij e^{δE_ij/RT}. */
  logTotal: number;
  /** ln Σ_j e^{δE_ij/RT} for each TS i. */
  logByTs: Float64Array;
  /** ln Σ_i e^{δE_ij/RT} for each intermediate j. */
  logByIntermediate: Float64Array;
}

/**
 * Row and column sums of the span matrix in O(N), from prefix and suffix log-sum-exps
 * (Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011), compact form of eq. 1). With t = T/RT,
 * a = −I/RT and g = ΔG_r/RT:
 *   row i    = t_i + ln( Σ_{j≤i} e^{a_j} + e^g Σ_{j>i} e^{a_j} )   (TS after / before I_j)
 *   column j = a_j + ln( Σ_{i≥j} e^{t_i} + e^g Σ_{i<j} e^{t_i} ).
 */
export function spanSums(t: Float64Array, a: Float64Array, g: number): SpanSums {
  const n = t.length;
  const aBefore = prefixLogSumExp(a);
  const aFrom = suffixLogSumExp(a);
  const tBefore = prefixLogSumExp(t);
  const tFrom = suffixLogSumExp(t);
  const logByTs = new Float64Array(n);
  const logByIntermediate = new Float64Array(n);
  let logTotal = -Infinity;
  for (let i = 0; i < n; i++) {
    logByTs[i] = t[i]! + logAddExp(aBefore[i + 1]!, g + aFrom[i + 1]!);
    logByIntermediate[i] = a[i]! + logAddExp(tFrom[i]!, g + tBefore[i]!);
    logTotal = logAddExp(logTotal, logByTs[i]!);
  }
  return { logTotal, logByTs, logByIntermediate };
}

/**
 * The largest span δE = max_ij δE_ij in J/mol and its (TS i, intermediate j), O(N) with a
 * running maximum of −I_j before each TS and a suffix maximum after it. Ties keep the earlier TS, then the
 * earlier intermediate.
 */
export function largestSpan(ts: Float64Array, ints: Float64Array, reactionEnergyJ: number): { deltaEJ: number; i: number; j: number } {
  const n = ts.length;
  const laterBest = new Int32Array(n + 1).fill(-1);
  for (let j = n - 1; j >= 0; j--) {
    const k = laterBest[j + 1]!;
    laterBest[j] = k >= 0 && ints[k]! < ints[j]! ? k : j;
  }
  let best = { deltaEJ: -Infinity, i: 0, j: 0 };
  let lowSoFar = -1;
  for (let i = 0; i < n; i++) {
    if (lowSoFar < 0 || ints[i]! < ints[lowSoFar]!) lowSoFar = i;
    const after = ts[i]! - ints[lowSoFar]!;
    if (after > best.deltaEJ) best = { deltaEJ: after, i, j: lowSoFar };
    const k = laterBest[i + 1]!;
    if (k >= 0) {
      const before = ts[i]! - ints[k]! + reactionEnergyJ;
      if (before > best.deltaEJ) best = { deltaEJ: before, i, j: k };
    }
  }
  return best;
}
