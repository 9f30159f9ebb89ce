import { writeFileSync } from 'node:fs';
import type { Command } from 'commander';
import { rankingSvg, rankingTikz } from '@cairn/engine';
import { EnginePool } from '@cairn/engine/pool';
import { CliError, EXIT } from '../cli-error';
import { loadGraph, reportWarnings } from '../load-graph';
import { labelPicture } from '../picture';
import { progressLine } from '../progress';

interface SolveFlags {
  method: 'auto' | 'exact' | 'bounds' | 'formula';
  timeLimit?: string;
  json?: boolean;
  picture?: boolean;
  svg?: string;
  tikz?: string;
  quiet?: boolean;
}

export function solveCommand(program: Command): void {
  program
    .command('solve')
    .description('the rank number, or the best [lower, upper] when a limit stops the search, with the certificate ranking')
    .argument('<graph>', 'a spec (grid:4x7, staircase:6, mask:FILE, path:10, ...), a graph file, or - for standard input')
    .option('-m, --method <method>', 'auto | exact | bounds | formula', 'auto')
    .option('-t, --time-limit <seconds>', 'stop the search after this long and report the bounds')
    .option('--json', 'print one JSON document (the SolveResult schema)')
    .option('--picture', 'draw the labels as a grid (grid-like graphs)')
    .option('--svg <file>', 'write the ranking as an SVG picture')
    .option('--tikz <file>', 'write the ranking as a TikZ picture')
    .option('-q, --quiet', 'no progress or warnings on stderr')
    .addHelpText('after', '\nExamples:\n  cairn solve grid:4x6\n  cairn solve staircase:6 --picture --svg s6.svg --tikz s6.tex\n  cairn solve plate.mtx --method bounds --json\n  cairn solve grid:8x8 --time-limit 30')
    .action(async (spec: string, flags: SolveFlags) => {
      if (!['auto', 'exact', 'bounds', 'formula'].includes(flags.method)) throw new CliError(`--method must be auto, exact, bounds or formula, got ${flags.method}`);
      const seconds = flags.timeLimit === undefined ? undefined : Number(flags.timeLimit);
      if (seconds !== undefined && !(seconds > 0)) throw new CliError(`--time-limit must be a number of seconds above 0, got ${flags.timeLimit}`);
      const loaded = loadGraph(spec);
      reportWarnings(loaded, flags.quiet === true);
      const pool = new EnginePool({ size: 1 });
      const controller = new AbortController();
      const onSigint = () => controller.abort();
      process.once('SIGINT', onSigint);
      const progress = progressLine(flags.quiet === true);
      try {
        const result = await pool.run(
          { kind: 'solve', spec, files: loaded.files, method: flags.method, ...(seconds !== undefined ? { timeLimitMs: seconds * 1000 } : {}) },
          { signal: controller.signal, onProgress: (p) => progress.update(p) },
        );
        progress.done();
        if (result.kind !== 'solve') throw new CliError('unexpected answer from the worker');
        const s = result.solution;
        if (flags.json) {
          process.stdout.write(`${JSON.stringify(s)}\n`);
        } else {
          const value = s.rankNumber !== null ? `rank number ${s.rankNumber}` : `rank number in [${s.lower}, ${s.upper}]`;
          process.stdout.write(`${spec}: ${value} (${s.provenance.value})\n`);
          process.stdout.write(`  lower ${s.lower}: ${s.provenance.lower.argument}\n`);
          process.stdout.write(`  upper ${s.upper}: ${s.provenance.upper.argument}\n`);
          process.stdout.write(`  certificate ${s.verified ? 'verified' : 'NOT verified'}; ${s.stats.nodes} search nodes, ${s.stats.elapsedMs} ms${s.stats.stopReason ? `, stopped: ${s.stats.stopReason}` : ''}\n`);
          if (flags.picture) {
            const picture = labelPicture(loaded.graph, s.labels);
            process.stdout.write(picture ?? '  (no picture: the graph is not grid-like)\n');
          }
        }
        if (flags.svg) writeFileSync(flags.svg, rankingSvg(loaded.graph, s.labels));
        if (flags.tikz) writeFileSync(flags.tikz, rankingTikz(loaded.graph, s.labels));
        if (s.rankNumber === null) process.exitCode = EXIT.limitReached;
      } finally {
        process.off('SIGINT', onSigint);
        await pool.close();
      }
    });
}

