/** One plotted series; points with null or (on a log axis) non-positive values are skipped. */
export interface Series {
  name: string;
  xs: number[];
  ys: (number | null)[];
}
