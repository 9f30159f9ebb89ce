import type { Command } from 'commander';
import { readLabelsCsv, verifyRanking } from '@cairn/engine';
import { EXIT } from '../cli-error';
import { loadGraph, readInput } from '../load-graph';

export function verifyCommand(program: Command): void {
  program
    .command('verify')
    .description('check that a labelling is a ranking; exit 0 when it is, 1 when it is not')
    .argument('<labels>', 'labels as CSV: grid rows for grid-like graphs, one label per line otherwise (- for stdin)')
    .requiredOption('-g, --graph <graph>', 'the graph: a spec or a file')
    .option('--json', 'print the verdict as JSON')
    .addHelpText('after', '\nExamples:\n  cairn verify paper-labels.csv --graph grid:4x7\n  cairn solve grid:3x5 --json | jq -r .labels[] | cairn verify - --graph path:15')
    .action((labelsFile: string, flags: { graph: string; json?: boolean }) => {
      const { graph } = loadGraph(flags.graph);
      const labels = readLabelsCsv(readInput(labelsFile), graph);
      const verdict = verifyRanking(graph, labels);
      if (flags.json) process.stdout.write(`${JSON.stringify(verdict)}\n`);
      else if (verdict.valid) process.stdout.write(`valid ranking with ${verdict.labelsUsed} labels (largest ${verdict.maxLabel})\n`);
      else {
        const { label, u, v, path } = verdict.violation;
        process.stdout.write(`not a ranking: vertices ${u} and ${v} both have label ${label}, joined by the path ${path.join('-')} with no larger label\n`);
      }
      process.exitCode = verdict.valid ? EXIT.ok : EXIT.negative;
    });
}
