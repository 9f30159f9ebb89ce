import { ParseError } from '../errors';
import { positionAt } from './text-position';

/** Input a reader accepts: text, or the bytes of a file (UTF-8). Readers never touch a file system. */
export type TextInput = string | Uint8Array;

/** How far into a byte input a NUL byte marks it as binary (the usual sniffing window). */
const BINARY_SNIFF_BYTES = 64 * 1024;
const BYTE_ORDER_MARK = 0xfeff;

/**
 * Turns reader input into text: bytes must be UTF-8 without NUL bytes, strings must hold no NUL, and a
 * leading byte-order mark is dropped, so every reader sees the same clean text and reports columns from it.
 */
export function decodeTextInput(input: TextInput, format: string): string {
  let text: string;
  if (typeof input === 'string') {
    text = input;
  } else if (input instanceof Uint8Array) {
    const nul = input.subarray(0, BINARY_SNIFF_BYTES).indexOf(0);
    if (nul >= 0) throw binaryData(format, bytePosition(input, nul));
    try {
      // fatal: a byte sequence that is not UTF-8 is refused, not turned into U+FFFD; the decoder drops a BOM.
      text = new TextDecoder('utf-8', { fatal: true }).decode(input);
    } catch {
      const bad = firstInvalidUtf8(input);
      throw binaryData(format, bad >= 0 ? bytePosition(input, bad) : { line: 1, column: 1 });
    }
  } else {
    throw new ParseError(format, { line: 1, column: 1 }, 'text (a string or UTF-8 bytes)', describeNonText(input));
  }
  if (text.charCodeAt(0) === BYTE_ORDER_MARK) text = text.slice(1);
  const nul = text.indexOf('\u0000');
  if (nul >= 0) throw binaryData(format, positionAt(text, nul));
  return text;
}

function binaryData(format: string, where: { line: number; column: number }): ParseError {
  return new ParseError(format, where, 'text', 'binary data');
}

function describeNonText(input: unknown): string {
  return input === null ? 'null' : typeof input;
}

/** Line and column of a byte offset, counting columns in bytes (the text could not be decoded). */
function bytePosition(bytes: Uint8Array, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset; i++) {
    if (bytes[i] === 10) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}

/**
 * Offset of the first byte that does not start a well-formed UTF-8 sequence (RFC 3629: no overlong
 * forms, no surrogates, nothing past U+10FFFF), or -1. Only run once TextDecoder has refused the bytes.
 */
function firstInvalidUtf8(bytes: Uint8Array): number {
  for (let i = 0; i < bytes.length; ) {
    const lead = bytes[i]!;
    if (lead < 0x80) {
      i++;
      continue;
    }
    let follow: number;
    let least: number;
    if (lead >= 0xc2 && lead <= 0xdf) [follow, least] = [1, 0x80];
    else if (lead >= 0xe0 && lead <= 0xef) [follow, least] = [2, 0x800];
    else if (lead >= 0xf0 && lead <= 0xf4) [follow, least] = [3, 0x10000];
    else return i;
    if (i + follow >= bytes.length) return i;
    let codePoint = lead & (0x3f >> follow);
    for (let k = 1; k <= follow; k++) {
      const next = bytes[i + k]!;
      if ((next & 0xc0) !== 0x80) return i;
      codePoint = (codePoint << 6) | (next & 0x3f);
    }
    if (codePoint < least || codePoint > 0x10ffff || (codePoint >= 0xd800 && codePoint <= 0xdfff)) return i;
    i += follow + 1;
  }
  return -1;
}
