import os from 'node:os';

/** The machine a figure was measured on, as every file in bench/results/ records it. */
export function machineDescription() {
  return { cpus: os.cpus().length, cpuModel: os.cpus()[0]?.model ?? 'unknown', node: process.version, memoryGiB: Math.round(os.totalmem() / 2 ** 30) };
}

/** The median of a sample (the mean of the middle two for an even count). */
export function median(sample: readonly number[]): number {
  const sorted = [...sample].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}
