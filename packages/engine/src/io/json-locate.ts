/**
 * Finds places in JSON text without building values: where the first syntax error is (for the messages in
 * which JSON.parse gives no position) and where the value at a path such as edges[3][1] is written (so
 * shape errors and warnings can name a line and column). Iterative, so deep nesting cannot overflow the stack.
 */

const QUOTE = 34;
const BACKSLASH = 92;
const COMMA = 44;
const COLON = 58;
const OPEN_ARRAY = 91;
const CLOSE_ARRAY = 93;
const OPEN_OBJECT = 123;
const CLOSE_OBJECT = 125;

/** A step of a JSON path: an object key or an array index. */
export type JsonPathStep = string | number;

/** The path as people write it: vertexCount, edges[3][1]; '(top level)' for the whole document. */
export function formatJsonPath(path: readonly JsonPathStep[]): string {
  let out = '';
  for (const step of path) out += typeof step === 'number' ? `[${step}]` : out === '' ? step : `.${step}`;
  return out === '' ? '(top level)' : out;
}

/** Offset of the first character that breaks the JSON grammar (RFC 8259), or -1 if the text is valid. */
export function findJsonSyntaxError(text: string): number {
  const walker = new JsonWalker(text);
  const end = walker.value(walker.space(0));
  if (end < 0) return walker.errorAt;
  const rest = walker.space(end);
  return rest < text.length ? rest : -1;
}

/** Offset where the value at `path` starts in valid JSON text, or -1 when there is no such value. */
export function jsonValueOffset(text: string, path: readonly JsonPathStep[]): number {
  const walker = new JsonWalker(text);
  let i = walker.space(0);
  for (const step of path) {
    i = typeof step === 'number' ? walker.element(i, step) : walker.member(i, step);
    if (i < 0) return -1;
  }
  return i;
}

/** Offsets of some elements (ascending indices) of the array at `path`; -1 for any that is missing. */
export function jsonElementOffsets(text: string, path: readonly JsonPathStep[], indices: readonly number[]): number[] {
  const out = indices.map(() => -1);
  const walker = new JsonWalker(text);
  let i = jsonValueOffset(text, path);
  if (i < 0 || text.charCodeAt(i) !== OPEN_ARRAY) return out;
  i = walker.space(i + 1);
  if (text.charCodeAt(i) === CLOSE_ARRAY) return out;
  let next = 0;
  for (let k = 0; next < indices.length; k++) {
    while (next < indices.length && indices[next]! === k) out[next++] = i;
    if (next === indices.length) break;
    i = walker.value(i);
    if (i < 0) break;
    i = walker.space(i);
    if (text.charCodeAt(i) !== COMMA) break;
    i = walker.space(i + 1);
  }
  return out;
}

class JsonWalker {
  /** Where the last failed step found a fault. */
  errorAt = -1;

  constructor(private readonly text: string) {}

  space(i: number): number {
    const text = this.text;
    while (i < text.length) {
      const c = text.charCodeAt(i);
      if (c !== 32 && c !== 9 && c !== 10 && c !== 13) break;
      i++;
    }
    return i;
  }

  /** Index just past the value starting at i, or -1 (with errorAt set). */
  value(i: number): number {
    const text = this.text;
    const open: number[] = []; // the containers we are inside, innermost last
    for (;;) {
      i = this.space(i);
      const c = text.charCodeAt(i);
      if (c === OPEN_OBJECT || c === OPEN_ARRAY) {
        const close = c === OPEN_OBJECT ? CLOSE_OBJECT : CLOSE_ARRAY;
        i = this.space(i + 1);
        if (text.charCodeAt(i) === close) {
          i++;
        } else {
          if (c === OPEN_OBJECT && (i = this.key(i)) < 0) return -1;
          open.push(c);
          continue;
        }
      } else if (c === QUOTE) {
        if ((i = this.string(i)) < 0) return -1;
      } else if (c === 45 || (c >= 48 && c <= 57)) {
        if ((i = this.number(i)) < 0) return -1;
      } else if (c === 116 || c === 102 || c === 110) {
        const word = c === 116 ? 'true' : c === 102 ? 'false' : 'null';
        if (!text.startsWith(word, i)) return this.fail(i);
        i += word.length;
      } else {
        return this.fail(i);
      }
      // A value is complete: close finished containers, or step to the next element or member.
      for (;;) {
        if (open.length === 0) return i;
        i = this.space(i);
        const d = text.charCodeAt(i);
        const inner = open[open.length - 1]!;
        if (d === COMMA) {
          i = this.space(i + 1);
          if (inner === OPEN_OBJECT && (i = this.key(i)) < 0) return -1;
          break;
        }
        if (d !== (inner === OPEN_OBJECT ? CLOSE_OBJECT : CLOSE_ARRAY)) return this.fail(i);
        open.pop();
        i++;
      }
    }
  }

  /** Offset of the value of `name` in the object at i (the last one, as JSON.parse keeps), or -1. */
  member(i: number, name: string): number {
    const text = this.text;
    if (text.charCodeAt(i) !== OPEN_OBJECT) return -1;
    i = this.space(i + 1);
    if (text.charCodeAt(i) === CLOSE_OBJECT) return -1;
    let found = -1;
    for (;;) {
      const keyEnd = this.string(i);
      if (keyEnd < 0) return -1;
      const key: unknown = JSON.parse(text.slice(i, keyEnd));
      i = this.space(keyEnd);
      if (text.charCodeAt(i) !== COLON) return -1;
      i = this.space(i + 1);
      if (key === name) found = i;
      i = this.value(i);
      if (i < 0) return -1;
      i = this.space(i);
      if (text.charCodeAt(i) !== COMMA) return found;
      i = this.space(i + 1);
    }
  }

  /** Offset of element `index` of the array at i, or -1. */
  element(i: number, index: number): number {
    const text = this.text;
    if (text.charCodeAt(i) !== OPEN_ARRAY) return -1;
    i = this.space(i + 1);
    if (text.charCodeAt(i) === CLOSE_ARRAY) return -1;
    for (let k = 0; k < index; k++) {
      i = this.value(i);
      if (i < 0) return -1;
      i = this.space(i);
      if (text.charCodeAt(i) !== COMMA) return -1;
      i = this.space(i + 1);
    }
    return i;
  }

  /** A member's key and colon; returns where its value may start. */
  private key(i: number): number {
    if (this.text.charCodeAt(i) !== QUOTE) return this.fail(i);
    i = this.string(i);
    if (i < 0) return -1;
    i = this.space(i);
    if (this.text.charCodeAt(i) !== COLON) return this.fail(i);
    return i + 1;
  }

  private string(i: number): number {
    const text = this.text;
    for (i++; i < text.length; ) {
      const c = text.charCodeAt(i);
      if (c === QUOTE) return i + 1;
      if (c < 0x20) return this.fail(i);
      if (c !== BACKSLASH) {
        i++;
        continue;
      }
      const e = text[i + 1];
      if (e !== undefined && '"\\/bfnrt'.includes(e)) i += 2;
      else if (e === 'u' && /^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) i += 6;
      else return this.fail(i + 1);
    }
    return this.fail(text.length);
  }

  private number(i: number): number {
    const text = this.text;
    const digits = (): number => {
      const start = i;
      while (i < text.length && text.charCodeAt(i) >= 48 && text.charCodeAt(i) <= 57) i++;
      return i - start;
    };
    if (text.charCodeAt(i) === 45) i++;
    if (text.charCodeAt(i) === 48) i++;
    else if (digits() === 0) return this.fail(i);
    if (text.charCodeAt(i) === 46) {
      i++;
      if (digits() === 0) return this.fail(i);
    }
    if (text.charCodeAt(i) === 101 || text.charCodeAt(i) === 69) {
      i++;
      if (text.charCodeAt(i) === 43 || text.charCodeAt(i) === 45) i++;
      if (digits() === 0) return this.fail(i);
    }
    return i;
  }

  private fail(at: number): -1 {
    this.errorAt = at;
    return -1;
  }
}
