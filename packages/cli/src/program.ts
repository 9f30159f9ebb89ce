import { Command } from 'commander';
import { version } from '../package.json';
import { boundsCommand } from './commands/bounds';
import { convertCommand } from './commands/convert';
import { edgeRankCommand } from './commands/edge-rank';
import { formulaCommand } from './commands/formula';
import { planCommand } from './commands/plan';
import { remoteCommand } from './commands/remote';
import { solveCommand } from './commands/solve';
import { sweepCommand } from './commands/sweep';
import { verifyCommand } from './commands/verify';

/** The `cairn` command tree. Built by a function so tests can run it without a process of its own. */
export function buildProgram(): Command {
  const program = new Command('cairn')
    .description('Cairn: vertex rankings, rank numbers and tree-depth of grids and general graphs')
    .version(version, '-V, --version', 'print the version of Cairn')
    .showHelpAfterError('(run cairn --help for the commands)')
    .addHelpText(
      'after',
      '\nExit status: 0 success, 1 a negative answer (not a ranking, no closed form), 2 bad usage or input, 3 a limit reached with bounds only.',
    );
  // Errors become exceptions (for every command added below), so the entry point picks the exit status.
  program.exitOverride().configureOutput({ outputError: (text, write) => write(text) });
  for (const add of [solveCommand, verifyCommand, boundsCommand, formulaCommand, sweepCommand, planCommand, edgeRankCommand, convertCommand, remoteCommand]) add(program);
  return program;
}
