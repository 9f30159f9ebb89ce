import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { cpus, totalmem } from 'node:os';
import { dirname, join } from 'node:path';
import { repoRoot } from './test-env';

export const reliabilityResultsFile = join(repoRoot, 'bench/results/reliability.json');

/**
 * Records one test's figures in bench/results/reliability.json under `key`, merged into the object that
 * is there (other keys are kept), with the date and a short description of the machine.
 */
export function recordReliability(key: string, figures: Record<string, unknown>): void {
  let doc: Record<string, unknown> = {};
  if (existsSync(reliabilityResultsFile)) {
    try {
      const parsed: unknown = JSON.parse(readFileSync(reliabilityResultsFile, 'utf8'));
      if (parsed && typeof parsed === 'object' && !Array.isArray(parsed)) doc = parsed as Record<string, unknown>;
    } catch {
      // A damaged file is replaced rather than failing the test that records into it.
    }
  }
  const machine = { cpus: cpus().length, cpuModel: cpus()[0]?.model.trim() ?? 'unknown', memoryGiB: Math.round(totalmem() / 2 ** 30), node: process.version };
  doc[key] = { recordedAt: new Date().toISOString(), machine, ...figures };
  mkdirSync(dirname(reliabilityResultsFile), { recursive: true });
  writeFileSync(reliabilityResultsFile, `${JSON.stringify(doc, null, 2)}\n`);
}
