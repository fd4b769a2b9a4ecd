/**
 * Output times for a simulation: 0, then `points` times ending at `until`, either evenly
 * spaced or evenly spaced in log t from `from` (for plots over many decades of time).
 */
export function timeGrid(until: number, points: number, logTime: boolean, from: number): number[] {
  const times = [0];
  if (logTime) {
    const a = Math.log10(from);
    const b = Math.log10(until);
    for (let k = 0; k < points; k++) times.push(k === points - 1 ? until : 10 ** (a + ((b - a) * k) / (points - 1)));
  } else {
    for (let k = 1; k <= points; k++) times.push(k === points ? until : (until * k) / points);
  }
  return times;
}

/**
 * A first plotted time a hundredth of the fastest time scale of the network, so the
 * earliest relaxation shows on a log axis: 0.01/max(k·c^(m−1)), never below until·1e-24 (24 decades on one axis is already more than a plot can show).
 */
export function firstLogTime(until: number, points: number, fastestRate: number): number {
  const guess = fastestRate > 0 ? 0.01 / fastestRate : until / points;
  return Math.min(Math.max(guess, until * 1e-24), until / 10);
}
