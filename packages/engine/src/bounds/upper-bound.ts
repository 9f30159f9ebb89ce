/** An upper bound on the rank number, always with the ranking that proves it. */
export interface UpperBound {
  /** The number of labels the ranking uses (its largest label; labels are 1..value). */
  value: number;
  labels: Int32Array;
  /** Which construction made it, e.g. 'midline-split', 'tree-optimal'. */
  construction: string;
  /** The argument in words. */
  argument: string;
}
