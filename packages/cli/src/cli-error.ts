/** Exit statuses of the cairn command. */
export const EXIT = { ok: 0, negative: 1, badInput: 2, limitReached: 3 } as const;

/** A problem to report in one line and exit with; never a stack trace. */
export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode: number = EXIT.badInput,
  ) {
    super(message);
  }
}
