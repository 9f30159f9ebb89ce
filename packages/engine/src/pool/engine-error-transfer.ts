import { EngineError, LabelError, ParseError, SizeError, SpecError } from '../errors';

/**
 * An EngineError as it crosses from a worker thread: structured clone keeps an error's message but not
 * its class or its code, so the worker sends these fields and the pool builds the same error again.
 */
export interface TransferredEngineError {
  name: string;
  code: string;
  message: string;
  parse?: { format: string; line: number; column: number; expected: string; found: string };
}

export function toTransferred(err: EngineError): TransferredEngineError {
  const out: TransferredEngineError = { name: err.name, code: err.code, message: err.message };
  if (err instanceof ParseError) out.parse = { format: err.format, line: err.line, column: err.column, expected: err.expected, found: err.found };
  return out;
}

/** The error the worker threw, of the same class, code and message. */
export function fromTransferred(t: TransferredEngineError): EngineError {
  let err: EngineError;
  if (t.parse) err = new ParseError(t.parse.format, { line: t.parse.line, column: t.parse.column }, t.parse.expected, t.parse.found);
  else if (t.name === 'SpecError') err = new SpecError(t.message);
  else if (t.name === 'LabelError') err = new LabelError(t.message);
  else if (t.name === 'SizeError') err = new SizeError(t.message);
  else err = new EngineError(t.code, t.message);
  // The message as thrown (a ParseError's may carry more than its fields rebuild).
  Object.defineProperty(err, 'message', { value: t.message, enumerable: false, writable: true, configurable: true });
  return err;
}
