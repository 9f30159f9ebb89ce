import type { Command } from 'commander';
import { formulaFor, graphFromSpec } from '@cairn/engine';
import { CliError, EXIT } from '../cli-error';

const SIZES: Record<string, (s: number[]) => string> = {
  path: ([n]) => `path:${n}`,
  cycle: ([n]) => `cycle:${n}`,
  complete: ([n]) => `complete:${n}`,
  star: ([n]) => `star:${n}`,
  bipartite: ([a, b]) => `bipartite:${a}x${b}`,
  grid: ([m, n]) => `grid:${m}x${n}`,
};

export function formulaCommand(program: Command): void {
  program
    .command('formula')
    .description('the closed-form rank number with its source, or "no closed form"')
    .argument('<family>', `one of ${Object.keys(SIZES).join(', ')}`)
    .argument('<size...>', 'the sizes: n, or rows and columns')
    .option('--json', 'print the value and its source as JSON')
    .addHelpText('after', '\nExamples:\n  cairn formula path 1000\n  cairn formula grid 2 9\n  cairn formula bipartite 3 4')
    .action((family: string, sizes: string[], flags: { json?: boolean }) => {
      const build = SIZES[family];
      if (!build) throw new CliError(`unknown family '${family}'; expected one of ${Object.keys(SIZES).join(', ')}`);
      const numbers = sizes.map(Number);
      const needed = family === 'bipartite' || family === 'grid' ? 2 : 1;
      if (numbers.length !== needed || numbers.some((n) => !Number.isInteger(n))) {
        throw new CliError(`${family} takes ${needed === 2 ? 'two whole sizes' : 'one whole size'}, got '${sizes.join(' ')}'`);
      }
      const found = formulaFor(graphFromSpec(build(numbers)));
      if (!found) {
        if (flags.json) process.stdout.write(`${JSON.stringify({ value: null })}\n`);
        else process.stdout.write(`no closed form for ${family} ${sizes.join(' x ')}; try cairn solve ${build(numbers)}\n`);
        process.exitCode = EXIT.negative;
        return;
      }
      const { value, formula } = found;
      if (flags.json) process.stdout.write(`${JSON.stringify({ value, id: formula.id, statement: formula.statement, source: formula.source })}\n`);
      else {
        const src = formula.source;
        process.stdout.write(`${value}\n  ${formula.statement}\n  source: ${[src.authors, src.title === 'common practice' ? undefined : `"${src.title}"`, src.venue, src.year].filter(Boolean).join(', ') || src.title}${src.basis === 'published' ? '' : ` (${src.basis})`}\n`);
      }
    });
}
