import { setMaxListeners } from 'node:events';
import { appendFileSync, existsSync, readFileSync, writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import type { Command } from 'commander';
import { parseGraphSpec } from '@cairn/engine';
import { EnginePool } from '@cairn/engine/pool';
import { CliError } from '../cli-error';
import { csvHeader, csvLine, jsonLine, readDoneRows, renderTable, type SweepRow } from '../sweep-table';

const TWO_SIZES = ['grid', 'cylinder', 'torus', 'bipartite'];
const ONE_SIZE = ['staircase', 'path', 'cycle', 'complete', 'star'];
const FORMATS = ['table', 'csv', 'json', 'md', 'tex'] as const;
type Format = (typeof FORMATS)[number];

interface SweepFlags {
  rows?: string;
  cols?: string;
  sizes?: string;
  jobs?: string;
  format: string;
  out?: string;
  resume?: boolean;
  method: string;
  timeLimit?: string;
  quiet?: boolean;
}

/** Reads "a..b" (or "a") as the whole numbers a, a + 1, ..., b. */
function range(text: string, name: string): number[] {
  const m = /^(\d+)(?:\.\.(\d+))?$/.exec(text.trim());
  if (!m) throw new CliError(`${name} must be a range like 2..9 (or one number), got '${text}'`);
  const a = Number(m[1]);
  const b = Number(m[2] ?? m[1]);
  if (a < 1 || b < a) throw new CliError(`${name} ${text} must run from a size >= 1 upwards`);
  if (b - a > 10_000) throw new CliError(`${name} ${text} is too long a range`);
  return Array.from({ length: b - a + 1 }, (_, i) => a + i);
}

export function sweepCommand(program: Command): void {
  program
    .command('sweep')
    .description('a table of rank numbers (or bounds) over a range of sizes, on worker threads')
    .argument('<family>', `${TWO_SIZES.join(', ')} (with --rows and --cols) or ${ONE_SIZE.join(', ')} (with --sizes)`)
    .option('-r, --rows <a..b>', 'the range of rows')
    .option('-c, --cols <c..d>', 'the range of columns')
    .option('-s, --sizes <a..b>', 'the range of sizes, for one-size families')
    .option('-j, --jobs <n>', 'worker threads (default: the core count)')
    .option('-f, --format <format>', 'table | csv | json | md | tex', 'table')
    .option('-o, --out <file>', 'write the table here (csv and json are written as cells finish)')
    .option('--resume', 'keep the cells already in --out and compute only the rest (csv or json)')
    .option('-m, --method <method>', 'auto | exact | bounds', 'auto')
    .option('-t, --time-limit <seconds>', 'per cell; a cell that reaches it is reported with its bounds')
    .option('-q, --quiet', 'no progress on stderr')
    .addHelpText('after', '\nExamples:\n  cairn sweep grid --rows 2..5 --cols 2..12 --format md\n  cairn sweep grid --rows 1..6 --cols 1..20 --time-limit 60 --format csv --out grids.csv --resume\n  cairn sweep staircase --sizes 1..9 --format tex')
    .action(async (family: string, flags: SweepFlags) => {
      if (!FORMATS.includes(flags.format as Format)) throw new CliError(`--format must be one of ${FORMATS.join(', ')}, got ${flags.format}`);
      const format = flags.format as Format;
      if (!['auto', 'exact', 'bounds'].includes(flags.method)) throw new CliError(`--method must be auto, exact or bounds, got ${flags.method}`);
      const cells: [number, number | null][] = [];
      if (TWO_SIZES.includes(family)) {
        if (!flags.rows || !flags.cols) throw new CliError(`${family} needs --rows and --cols`);
        for (const m of range(flags.rows, '--rows')) for (const n of range(flags.cols, '--cols')) cells.push([m, n]);
      } else if (ONE_SIZE.includes(family)) {
        if (!flags.sizes) throw new CliError(`${family} needs --sizes`);
        for (const s of range(flags.sizes, '--sizes')) cells.push([s, null]);
      } else {
        throw new CliError(`unknown family '${family}' for a sweep; expected one of ${[...TWO_SIZES, ...ONE_SIZE].join(', ')}`);
      }
      const specOf = ([m, n]: [number, number | null]) => (n === null ? `${family}:${m}` : `${family}:${m}x${n}`);
      for (const c of cells) parseGraphSpec(specOf(c)); // every size checked before any work starts
      const seconds = flags.timeLimit === undefined ? undefined : Number(flags.timeLimit);
      if (seconds !== undefined && !(seconds > 0)) throw new CliError(`--time-limit must be a number of seconds above 0, got ${flags.timeLimit}`);
      const jobs = flags.jobs === undefined ? availableParallelism() : Number(flags.jobs);
      if (!Number.isInteger(jobs) || jobs < 1) throw new CliError(`--jobs must be a whole number >= 1, got ${flags.jobs}`);

      const streaming = flags.out !== undefined && (format === 'csv' || format === 'json');
      let done: SweepRow[] = [];
      if (flags.resume) {
        if (!streaming) throw new CliError('--resume needs --out with --format csv or json');
        if (existsSync(flags.out!)) {
          try {
            done = readDoneRows(readFileSync(flags.out!, 'utf8'), format as 'csv' | 'json').filter((r) => r.status !== 'interrupted' && r.family === family);
          } catch (err) {
            throw new CliError(`cannot resume from ${flags.out}: ${(err as Error).message}`);
          }
        }
      }
      const key = (m: number, n: number | null) => `${m},${n ?? ''}`;
      const finished = new Set(done.map((r) => key(r.rows, r.cols)));
      const todo = cells.filter(([m, n]) => !finished.has(key(m, n)));
      if (streaming) {
        // Rewrite the file with the rows kept, so interrupted ones are not listed twice.
        writeFileSync(flags.out!, (format === 'csv' ? csvHeader() : '') + done.map(format === 'csv' ? csvLine : jsonLine).join(''));
      }
      if (!flags.quiet && done.length) process.stderr.write(`cairn: resuming: ${done.length} cells already in ${flags.out}, ${todo.length} to go\n`);

      const pool = new EnginePool({ size: jobs });
      const controller = new AbortController();
      setMaxListeners(0, controller.signal); // one listener per cell in flight
      const onSigint = () => controller.abort();
      process.once('SIGINT', onSigint);
      const rows: SweepRow[] = [...done];
      let count = 0;
      try {
        await Promise.all(
          todo.map(async ([m, n]) => {
            const started = Date.now();
            const result = await pool.run(
              { kind: 'solve', spec: specOf([m, n]), method: flags.method as 'auto', ...(seconds !== undefined ? { timeLimitMs: seconds * 1000 } : {}) },
              { signal: controller.signal },
            );
            if (result.kind !== 'solve') return;
            const s = result.solution;
            const status: SweepRow['status'] = s.rankNumber !== null ? 'exact' : s.stats.stopReason === 'aborted' ? 'interrupted' : 'bounds';
            const row: SweepRow = { family, rows: m, cols: n, rankNumber: s.rankNumber, lower: s.lower, upper: s.upper, provenance: s.provenance.value, elapsedMs: Date.now() - started, status };
            rows.push(row);
            if (streaming) appendFileSync(flags.out!, format === 'csv' ? csvLine(row) : jsonLine(row));
            count++;
            if (!flags.quiet && process.stderr.isTTY) process.stderr.write(`\r\x1b[Kcells ${count}/${todo.length}`);
          }),
        );
      } finally {
        process.off('SIGINT', onSigint);
        await pool.close();
        if (!flags.quiet && process.stderr.isTTY && count) process.stderr.write('\r\x1b[K');
      }
      rows.sort((a, b) => a.rows - b.rows || (a.cols ?? 0) - (b.cols ?? 0));
      if (!streaming) {
        const text = format === 'csv' ? csvHeader() + rows.map(csvLine).join('') : format === 'json' ? rows.map(jsonLine).join('') : renderTable(rows, format);
        if (flags.out) writeFileSync(flags.out, text);
        else process.stdout.write(text);
      }
      if (controller.signal.aborted) {
        process.stderr.write(`cairn: interrupted; ${rows.filter((r) => r.status !== 'interrupted').length} of ${cells.length} cells done${streaming ? `, run again with --resume to finish ${flags.out}` : ''}\n`);
        process.exitCode = 130;
      }
    });
}
