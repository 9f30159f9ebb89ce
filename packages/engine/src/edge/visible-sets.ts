/**
 * Visible-label sets of rooted subtrees, held as numbers: label l is bit l - 1, so a set of labels up to
 * 53 is one exact double (sums of distinct powers of two below 2^53 are exact). Comparing such numbers
 * compares the sets by their largest differing label, the order the tree algorithm minimises.
 */
export const MAX_NARROW_LABEL = 53;

/** 2^i for i = 0 .. 53, exact. */
export const POW2: Float64Array = Float64Array.from({ length: MAX_NARROW_LABEL + 1 }, (_, i) => 2 ** i);

/** Thrown inside the narrow (double) path when a set needs a label above 53; the caller retries wide. */
export class NarrowOverflow extends Error {
  constructor() {
    super('more than 53 labels: the narrow visible-set path overflowed');
  }
}

/** The position of the highest set bit of a set held as a number, -1 for the empty set. */
export function topBit(x: number): number {
  if (x < 4294967296) return 31 - Math.clz32(x);
  let h = Math.floor(Math.log2(x));
  if (POW2[h]! > x) h--;
  else if (h < MAX_NARROW_LABEL && POW2[h + 1]! <= x) h++;
  return h;
}

/** The position of the lowest clear bit of x (x >= 0 a whole number below 2^53). */
export function lowestClearBit(x: number): number {
  if (x < 2147483647) {
    const y = ~x & (x + 1);
    return 31 - Math.clz32(y);
  }
  let i = 0;
  while (Math.floor(x / POW2[i]!) % 2 === 1) i++;
  return i;
}
