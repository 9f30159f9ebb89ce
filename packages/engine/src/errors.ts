/** Every error the engine throws on purpose carries a stable code, so callers can tell them apart. */
export class EngineError extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** Where in a text input a problem is: 1-based line and column. */
export interface TextPosition {
  line: number;
  column: number;
}

/**
 * A file or text that cannot be read: what is wrong, where (line and column, 1-based), what was
 * expected and what was found instead. The message says all of it in one sentence.
 */
export class ParseError extends EngineError {
  readonly line: number;
  readonly column: number;
  readonly expected: string;
  readonly found: string;
  /** Which reader raised it, e.g. 'matrix-market', 'dimacs', 'edge-list', 'mask', 'json', 'labels-csv'. */
  readonly format: string;

  constructor(format: string, where: TextPosition, expected: string, found: string, what?: string) {
    super('parse_error', `${format}: line ${where.line}, column ${where.column}: ${what ? `${what}: ` : ''}expected ${expected}, found ${found}`);
    this.format = format;
    this.line = where.line;
    this.column = where.column;
    this.expected = expected;
    this.found = found;
  }
}

/** A graph spec (`grid:4x7`, `staircase:6`, ...) that names no graph Cairn can build. */
export class SpecError extends EngineError {
  constructor(message: string) {
    super('spec_error', message);
  }
}

/** A labelling that is not a list of positive whole numbers, one per vertex; not a verdict on rankings. */
export class LabelError extends EngineError {
  constructor(message: string) {
    super('label_error', message);
  }
}

/** A size or parameter outside what a family or structure can hold. */
export class SizeError extends EngineError {
  constructor(message: string) {
    super('size_error', message);
  }
}
