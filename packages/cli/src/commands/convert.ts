import { writeFileSync } from 'node:fs';
import type { Command } from 'commander';
import { writeGraph, type GraphFormat } from '@cairn/engine';
import { CliError } from '../cli-error';
import { loadGraph, reportWarnings } from '../load-graph';

const BY_EXTENSION: Record<string, GraphFormat> = { mtx: 'matrix-market', gr: 'dimacs', dimacs: 'dimacs', col: 'dimacs', json: 'json', txt: 'edge-list', edges: 'edge-list', el: 'edge-list' };

export function convertCommand(program: Command): void {
  program
    .command('convert')
    .description('write a graph in another format (edge list, DIMACS, Matrix Market, JSON)')
    .argument('<in>', 'a graph file or spec')
    .argument('<out>', 'the file to write, or - for standard output')
    .option('--to <format>', 'edge-list | dimacs | matrix-market | json (else taken from the extension of <out>)')
    .addHelpText('after', '\nExamples:\n  cairn convert mesh.mtx mesh.gr\n  cairn convert grid:4x7 - --to json')
    .action((input: string, out: string, flags: { to?: string }) => {
      const loaded = loadGraph(input);
      reportWarnings(loaded, false);
      const ext = out.includes('.') ? out.slice(out.lastIndexOf('.') + 1).toLowerCase() : '';
      const format = (flags.to ?? BY_EXTENSION[ext]) as GraphFormat | undefined;
      if (!format) throw new CliError(`cannot tell the format of ${out}; name it with --to edge-list|dimacs|matrix-market|json`);
      const text = writeGraph(loaded.graph, format);
      if (out === '-') process.stdout.write(text);
      else {
        writeFileSync(out, text);
        process.stderr.write(`cairn: wrote ${loaded.graph.vertexCount} vertices and ${loaded.graph.edgeCount} edges to ${out} (${format})\n`);
      }
    });
}
