import { median } from '../machine';

/** min / median / max of a sample, rounded to 0.1 ms, with the samples themselves in the order taken. */
export function summary(sample: readonly number[]) {
  const round = (x: number) => Math.round(x * 10) / 10;
  return { minMs: round(Math.min(...sample)), medianMs: round(median(sample)), maxMs: round(Math.max(...sample)), samplesMs: sample.map(round) };
}
