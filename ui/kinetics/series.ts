/** One plotted series; points with null or (on a log axis) non-positive values are skipped. */
export interface Series {
  name: string;
  xs: number[];
  ys: (number | null)[];
  /** A Monte Carlo band under the line: the 2.5th and 97.5th percentiles at each x (same length as xs). */
  band?: { low: (number | null)[]; high: (number | null)[] };
}
