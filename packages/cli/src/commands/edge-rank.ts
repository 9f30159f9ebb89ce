import type { Command } from 'commander';
import { assemblyPlan, edgeRankingByLineGraph, isForest, optimalTreeEdgeRanking, verifyEdgeRanking } from '@cairn/engine';
import { loadGraph } from '../load-graph';

export function edgeRankCommand(program: Command): void {
  program
    .command('edge-rank')
    .description('an edge ranking and its assembly steps (step s joins every edge labelled s); optimal for trees')
    .argument('<graph>', 'a spec or a graph file')
    .option('--json', 'print the labels and steps as JSON')
    .addHelpText('after', '\nExamples:\n  cairn edge-rank tree:cabinet.parents\n  cairn edge-rank assembly.txt --json')
    .action((spec: string, flags: { json?: boolean }) => {
      const { graph } = loadGraph(spec);
      const tree = isForest(graph);
      const labels = tree ? optimalTreeEdgeRanking(graph) : edgeRankingByLineGraph(graph).labels;
      const verdict = verifyEdgeRanking(graph, labels);
      const steps = assemblyPlan(graph, labels);
      if (flags.json) {
        process.stdout.write(`${JSON.stringify({ optimal: tree, labels: Array.from(labels), steps: steps.map(({ step, label, pairs }) => ({ step, label, pairs })) })}\n`);
        return;
      }
      process.stdout.write(`${steps.length} assembly steps for ${graph.edgeCount} joints (${tree ? 'optimal: the graph is a forest' : 'from a ranking of the line graph'}; ${verdict.valid ? 'verified' : 'NOT verified'})\n`);
      for (const s of steps) {
        const shown = s.pairs.length > 8 ? `${s.pairs.slice(0, 8).map(([u, v]) => `${u}-${v}`).join(' ')} ...` : s.pairs.map(([u, v]) => `${u}-${v}`).join(' ');
        process.stdout.write(`  step ${s.step}: ${s.pairs.length} joint(s): ${shown}\n`);
      }
    });
}
