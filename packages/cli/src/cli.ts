import { EngineError } from '@cairn/engine';
import { CommanderError } from 'commander';
import { CliError, EXIT } from './cli-error';
import { buildProgram } from './program';

// A reader that stops early (`cairn solve … | head`) closes the pipe: what is left to print has no one
// to read it, so the command ends quietly, as Unix tools do (common practice), not with a stack trace.
process.stdout.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code !== 'EPIPE') throw err;
  process.exit(process.exitCode ?? EXIT.ok);
});

// Known problems end in one line on stderr and the matching exit status; never a stack trace.
try {
  await buildProgram().parseAsync(process.argv);
} catch (err) {
  if (err instanceof CommanderError) {
    process.exitCode = err.exitCode === 0 ? EXIT.ok : EXIT.badInput;
  } else if (err instanceof CliError || err instanceof EngineError) {
    process.stderr.write(`cairn: ${err.message}\n`);
    process.exitCode = err instanceof CliError ? err.exitCode : EXIT.badInput;
  } else {
    process.stderr.write(`cairn: unexpected failure: ${err instanceof Error ? err.message : String(err)}\n`);
    process.exitCode = 70;
  }
}
