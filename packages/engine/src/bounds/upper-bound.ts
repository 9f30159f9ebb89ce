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

/** The bound a ranking proves: its largest label, with the construction's name and its argument in words. */
export function boundOfRanking(labels: Int32Array, construction: string, argument: (value: number) => string): UpperBound {
  let value = 0;
  for (const l of labels) if (l > value) value = l;
  return { value, labels, construction, argument: argument(value) };
}
