/** min / median / max of a sample, rounded to 0.1 ms, with the samples themselves in the order taken. */
export function summary(sample: readonly number[]) {
  const sorted = [...sample].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  const median = sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
  const round = (x: number) => Math.round(x * 10) / 10;
  return { minMs: round(sorted[0]!), medianMs: round(median), maxMs: round(sorted.at(-1)!), samplesMs: sample.map(round) };
}
