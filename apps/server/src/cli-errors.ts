import { ConfigError } from './config';
import { PortTakenError } from './http/listen';

/** Ends a command-line entry point: known problems print one line, anything else its message. */
export function exitWithError(what: string, err: unknown): never {
  if (err instanceof PortTakenError || err instanceof ConfigError) {
    process.stderr.write(`cairn: ${err.message}\n`);
  } else {
    const message = err instanceof Error ? err.message : String(err);
    process.stderr.write(`cairn: ${what} failed: ${message}\n`);
  }
  process.exit(1);
}
