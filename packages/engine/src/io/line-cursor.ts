import { ParseError, type TextPosition } from '../errors';
import { endOfTextPosition, isBlankChar, quoted } from './text-position';

const COMMA = 44;

/**
 * Walks a text line by line and field by field with indices and charCodeAt, so a reader scans a file of
 * millions of lines once without splitting it into strings. A line excludes its "\n" or "\r\n".
 */
export class LineCursor {
  readonly text: string;
  /** Which reader owns the cursor: the `format` of the errors it throws. */
  readonly format: string;
  /** 1-based number of the current line; 0 before the first nextLine(). */
  line = 0;
  /** Index of the current line's first character. */
  start = 0;
  /** Index just past the current line's last character. */
  end = 0;
  /** Reading position inside the current line. */
  pos = 0;
  private readonly commaSeparates: boolean;
  private following = 0;

  /** commaSeparates: a comma ends a number as white space does (edge lists, CSV). */
  constructor(text: string, format: string, options: { commaSeparates?: boolean } = {}) {
    this.text = text;
    this.format = format;
    this.commaSeparates = options.commaSeparates ?? false;
  }

  /** Moves to the next line; false at the end of the text (a final newline opens no empty last line). */
  nextLine(): boolean {
    const from = this.following;
    const text = this.text;
    if (from >= text.length) return false;
    let newline = text.indexOf('\n', from);
    if (newline < 0) newline = text.length;
    this.following = newline + 1;
    this.start = from;
    this.pos = from;
    this.end = newline > from && text.charCodeAt(newline - 1) === 13 ? newline - 1 : newline;
    this.line++;
    return true;
  }

  /** Skips spaces and tabs (and stray carriage returns). */
  skipSpaces(): void {
    const text = this.text;
    let p = this.pos;
    while (p < this.end && isBlankChar(text.charCodeAt(p))) p++;
    this.pos = p;
  }

  atLineEnd(): boolean {
    return this.pos >= this.end;
  }

  /** The character code at pos, or -1 at the end of the line. */
  peek(): number {
    return this.pos < this.end ? this.text.charCodeAt(this.pos) : -1;
  }

  /** The current line holds nothing but white space. */
  isBlankLine(): boolean {
    const text = this.text;
    for (let p = this.start; p < this.end; p++) if (!isBlankChar(text.charCodeAt(p))) return false;
    return true;
  }

  isDelimiter(c: number): boolean {
    return isBlankChar(c) || (this.commaSeparates && c === COMMA);
  }

  /** Index just past the field that starts at `from` (up to white space, a separating comma or the line end). */
  fieldEnd(from: number): number {
    let p = from;
    while (p < this.end && !this.isDelimiter(this.text.charCodeAt(p))) p++;
    return p;
  }

  /** The field at `from` as an error's "found": quoted text, or "end of line". */
  found(from: number = this.pos): string {
    if (from >= this.end) return 'end of line';
    const to = this.fieldEnd(from);
    return to === from ? quoted(this.text[from]!) : quoted(this.text.slice(from, to));
  }

  /** Skips white space and reads the next field as a word (a keyword, a format name); '' at the line end. */
  readWord(): string {
    this.skipSpaces();
    const from = this.pos;
    this.pos = this.fieldEnd(from);
    return this.text.slice(from, this.pos);
  }

  /**
   * Skips white space and reads a whole number in min..max written in decimal digits; anything else
   * (a sign, a fraction, a letter, nothing) throws a ParseError naming `expected`.
   */
  readWhole(expected: string, min: number, max: number, what?: string): number {
    this.skipSpaces();
    const text = this.text;
    const end = this.end;
    const from = this.pos;
    let p = from;
    let value = 0;
    for (; p < end; p++) {
      const c = text.charCodeAt(p);
      if (c < 48 || c > 57) break;
      value = value * 10 + (c - 48);
    }
    if (p === from || (p < end && !this.isDelimiter(text.charCodeAt(p)))) this.fail(from, expected, this.found(from), what);
    if (value < min || value > max) this.fail(from, expected, text.slice(from, p), what);
    this.pos = p;
    return value;
  }

  /** After the last field: only white space may follow on the line. */
  expectLineEnd(expected = 'end of line'): void {
    this.skipSpaces();
    if (this.pos < this.end) this.fail(this.pos, expected, this.found());
  }

  /** The position of an index on the current line. */
  where(at: number = this.pos): TextPosition {
    return { line: this.line, column: at - this.start + 1 };
  }

  /** Where "end of file" errors point: past the last non-blank character of the text. */
  endOfText(): TextPosition {
    return endOfTextPosition(this.text);
  }

  /** Throws this reader's ParseError at an index of the current line. */
  fail(at: number, expected: string, found: string, what?: string): never {
    throw new ParseError(this.format, this.where(at), expected, found, what);
  }
}
