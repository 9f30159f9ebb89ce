import { Command } from 'commander';
import { version } from '../package.json';

/** The `cairn` command tree. Built by a function so tests can run it without a process of its own. */
export function buildProgram(): Command {
  const program = new Command('cairn')
    .description('Cairn: vertex rankings, rank numbers and tree-depth of grids and general graphs')
    .version(version, '-V, --version', 'print the version of Cairn')
    .showHelpAfterError('(run cairn --help for the commands)');
  return program;
}
