import type { Command } from 'commander';
import { bestUpperBound, eliminationOrder, readLabelsCsv, stepPlan } from '@cairn/engine';
import { loadGraph, readInput } from '../load-graph';

export function planCommand(program: Command): void {
  program
    .command('plan')
    .description('the step plan and elimination order of a ranking (the best construction\u2019s when no labels are given)')
    .argument('<graph>', 'a spec or a graph file')
    .option('-l, --labels <file>', 'a ranking as label CSV to read the plan from')
    .option('--json', 'print the plan as JSON')
    .addHelpText('after', '\nExamples:\n  cairn plan mesh.mtx\n  cairn plan grid:4x7 --labels ranking.csv --json')
    .action((spec: string, flags: { labels?: string; json?: boolean }) => {
      const { graph } = loadGraph(spec);
      const labels = flags.labels ? readLabelsCsv(readInput(flags.labels), graph) : bestUpperBound(graph).best.labels;
      const steps = stepPlan(graph, labels);
      const order = Array.from(eliminationOrder(graph, labels));
      if (flags.json) {
        process.stdout.write(`${JSON.stringify({ steps, eliminationOrder: order })}\n`);
        return;
      }
      process.stdout.write(`${steps.length} steps for ${graph.vertexCount} vertices\n`);
      process.stdout.write('step  label  count  vertices\n');
      for (const s of steps) {
        const shown = s.vertices.length > 12 ? `${s.vertices.slice(0, 12).join(' ')} ...` : s.vertices.join(' ');
        process.stdout.write(`${String(s.step).padStart(4)}  ${String(s.label).padStart(5)}  ${String(s.vertices.length).padStart(5)}  ${shown}\n`);
      }
      process.stdout.write(`elimination order: ${order.length > 40 ? `${order.slice(0, 40).join(' ')} ...` : order.join(' ')}\n`);
    });
}
