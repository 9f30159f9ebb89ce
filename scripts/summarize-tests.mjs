// Adds up the vitest JSON reports of every package into one closing line: "tests: N passed, N failed".
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const dir = process.argv[2];
const expected = ['schema', 'engine', 'cli', 'server', 'web', 'bench', 'tests'];
let passed = 0;
let failed = 0;
let skipped = 0;
const lines = [];
const found = new Set();
for (const file of readdirSync(dir).filter((f) => f.endsWith('.json')).sort()) {
  const name = file.replace(/\.json$/, '');
  found.add(name);
  const r = JSON.parse(readFileSync(join(dir, file), 'utf8'));
  passed += r.numPassedTests;
  // A file that broke before any test ran counts as one failure of its own.
  const brokenFiles = (r.testResults ?? []).filter((t) => t.status === 'failed' && !t.assertionResults.some((a) => a.status === 'failed')).length;
  failed += r.numFailedTests + brokenFiles;
  skipped += r.numPendingTests + (r.numTodoTests ?? 0);
  lines.push(`  ${name.padEnd(8)} ${String(r.numPassedTests).padStart(4)} passed  ${String(r.numFailedTests).padStart(3)} failed`);
}
const missing = expected.filter((n) => !found.has(n));
process.stdout.write(`\nCairn test summary\n${lines.join('\n')}\n`);
if (missing.length) process.stdout.write(`  no report from: ${missing.join(', ')} (their run broke before any test)\n`);
const failures = failed + missing.length;
process.stdout.write(`tests: ${passed} passed, ${failures} failed${skipped ? `, ${skipped} skipped` : ''}\n`);
process.exit(failures > 0 || passed === 0 ? 1 : 0);
