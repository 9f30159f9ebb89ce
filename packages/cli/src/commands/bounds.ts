import type { Command } from 'commander';
import { bestLowerBound, bestUpperBound, gridLowerBounds } from '@cairn/engine';
import { loadGraph, reportWarnings } from '../load-graph';

export function boundsCommand(program: Command): void {
  program
    .command('bounds')
    .description('every lower and upper bound Cairn knows for a graph, each with its argument')
    .argument('<graph>', 'a spec or a graph file')
    .option('--json', 'print the bounds as JSON')
    .addHelpText('after', '\nExamples:\n  cairn bounds grid:12x12\n  cairn bounds mesh.mtx --json')
    .action((spec: string, flags: { json?: boolean }) => {
      const loaded = loadGraph(spec);
      reportWarnings(loaded, false);
      const g = loaded.graph;
      const lower: { value: number; argument: string; witness: string }[] = bestLowerBound(g).all.map((b) => ({ value: b.value, argument: b.argument, witness: b.witness.kind }));
      if (g.family?.kind === 'grid') for (const b of gridLowerBounds(g.family.rows, g.family.cols)) lower.push({ value: b.value, argument: b.argument, witness: 'size' });
      lower.sort((a, b) => b.value - a.value);
      const upper = bestUpperBound(g).all.map((b) => ({ value: b.value, construction: b.construction, argument: b.argument }));
      if (flags.json) {
        process.stdout.write(`${JSON.stringify({ lower, upper })}\n`);
        return;
      }
      process.stdout.write(`${spec}: rank number in [${lower[0]!.value}, ${upper[0]!.value}]\n`);
      process.stdout.write('lower bounds:\n');
      for (const b of lower) process.stdout.write(`  ${String(b.value).padStart(5)}  ${b.argument}\n`);
      process.stdout.write('upper bounds (each with a verified ranking):\n');
      for (const b of upper) process.stdout.write(`  ${String(b.value).padStart(5)}  ${b.construction}: ${b.argument}\n`);
    });
}
