// Bad input, part 2: every engine reader and the spec parser, fed arbitrary and near-valid input.
// Each call must return a value or throw an EngineError subclass (a ParseError at line >= 1, column >= 1
// for the readers), never anything else, and must answer quickly (no hang, no blow-up on a small input).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  EngineError,
  Graph,
  ParseError,
  MAX_VERTICES,
  SPEC_FAMILIES,
  formatMaskText,
  graphFromEdges,
  graphFromSpec,
  gridGraph,
  maskGraph,
  parseGraphSpec,
  parseMaskText,
  pathGraph,
  randomGraph,
  readDimacs,
  readEdgeList,
  readGraph,
  readJsonGraph,
  readLabelsCsv,
  readMatrixMarket,
  writeDimacs,
  writeEdgeList,
  writeJsonGraph,
  writeLabelsCsv,
  writeMatrixMarket,
  type GraphSpec,
  type ReadResult,
  type TextInput,
} from '@cairn/engine';

// CAIRN_FUZZ_RUNS raises it for a one-off deeper search; the suite runs 10,000 cases per property.
const RUNS = Number(process.env.CAIRN_FUZZ_RUNS ?? 10_000);
/** One call on an input of at most a few hundred characters; generous for a loaded 2-core machine. */
const CALL_BUDGET_MS = 1_000;
const PROPERTY_TIMEOUT_MS = 60_000;
const params = { numRuns: RUNS };

// ---------------------------------------------------------------------------------------------------
// The contract

type Outcome = { ok: true; value: unknown } | { ok: false; error: EngineError };

/** Outcomes of the current property, so each test can check its inputs reach both answers. */
const tally = { ok: 0, refused: 0 };
function resetTally(): void {
  tally.ok = 0;
  tally.refused = 0;
}
/** The generators must make inputs that parse and inputs that do not (each at least 0.5%), or the property tests little. */
function expectBothOutcomes(): void {
  const total = tally.ok + tally.refused;
  console.info(`  ${tally.ok} accepted, ${tally.refused} refused with an EngineError`);
  expect(tally.ok, 'accepted inputs').toBeGreaterThan(total / 200);
  expect(tally.refused, 'refused inputs').toBeGreaterThan(total / 200);
}

/** Runs fn within the time budget; a throw must be an EngineError (a positioned ParseError when `parse`). */
function contained(fn: () => unknown, kind: 'parse' | 'engine'): Outcome {
  const started = performance.now();
  let outcome: Outcome;
  try {
    outcome = { ok: true, value: fn() };
  } catch (err) {
    if (!(err instanceof EngineError)) {
      throw new Error(`threw a non-EngineError: ${describeError(err)}`);
    }
    if (kind === 'parse') {
      if (!(err instanceof ParseError)) throw new Error(`a reader threw ${err.name} (${err.code}) instead of a ParseError: ${err.message}`);
    }
    if (err instanceof ParseError) {
      if (!Number.isInteger(err.line) || err.line < 1 || !Number.isInteger(err.column) || err.column < 1) {
        throw new Error(`ParseError at line ${err.line}, column ${err.column}: ${err.message}`);
      }
    }
    if (typeof err.code !== 'string' || err.code === '' || typeof err.message !== 'string' || err.message === '') {
      throw new Error(`EngineError without a code or message: ${describeError(err)}`);
    }
    outcome = { ok: false, error: err };
  }
  if (outcome.ok) tally.ok++;
  else tally.refused++;
  const elapsed = performance.now() - started;
  if (elapsed > CALL_BUDGET_MS) throw new Error(`took ${elapsed.toFixed(0)} ms (budget ${CALL_BUDGET_MS} ms)`);
  return outcome;
}

function describeError(err: unknown): string {
  if (err instanceof Error) return `${err.constructor.name}: ${err.message}\n${err.stack ?? ''}`;
  return `${typeof err}: ${String(err)}`;
}

/** What every successful read must look like. */
function checkRead(outcome: Outcome): void {
  if (!outcome.ok) return;
  const read = outcome.value as ReadResult;
  expect(read.graph).toBeInstanceOf(Graph);
  expect(Number.isInteger(read.graph.vertexCount) && read.graph.vertexCount >= 0).toBe(true);
  expect(Number.isInteger(read.graph.edgeCount) && read.graph.edgeCount >= 0).toBe(true);
  expect(read.warnings.length).toBeLessThanOrEqual(100);
  expect(read.warningCount).toBeGreaterThanOrEqual(read.warnings.length);
  for (const w of read.warnings) expect(w.line >= 1 && w.column >= 1).toBe(true);
}

// ---------------------------------------------------------------------------------------------------
// Inputs: arbitrary text and bytes, tokens of the formats, and mutations of small valid files

/** Strings that break parsers: huge, negative, fractional and unicode numbers, NUL, BOM, odd line ends. */
const HOSTILE_TOKENS = [
  '0', '-0', '-1', '-7', '+3', '1.5', '1e3', '1e309', '0x10', '007', 'NaN', 'Infinity', '-Infinity',
  '10000001', '2147483647', '2147483648', '4294967296', '9007199254740991', '9007199254740993',
  '99999999999999999999999999999999', '1'.repeat(400),
  '\u0000', '\ufeff', '\r', '\r\n', '\t', '\u00a0', '\u2028', '\u2029', '\u000b', '\u000c',
  '\ud800', '\udfff', 'é', '١٢', '３', '🙂', '𝟙', 'ǅ', '\u202e', 'ﬀ',
  ',', ';', ':', '"', "'", '#', '%', '.', '[', ']', '{', '}', 'null', 'true', '"x"', '__proto__', 'constructor',
  "'; DROP TABLE runs; --",
];

/** The words of the formats, so random token streams are often almost a file. */
const FORMAT_TOKENS = [
  '\n', '\n', '\n', ' ', ' ', ' ', '1', '2', '3', '4', '0', '5',
  'p', 'edge', 'tw', 'col', 'e', 'c', 'n',
  '%%MatrixMarket', 'matrix', 'coordinate', 'array', 'pattern', 'real', 'integer', 'complex', 'general', 'symmetric', 'skew-symmetric', 'hermitian', '%',
  '{', '}', '[', ']', ':', ',', '"vertexCount"', '"edges"', '"name"',
  '#', '.', '##', '..', '#.#', 'label', 'vertex', 'vertex,label',
];

const hostileToken = fc.constantFrom(...HOSTILE_TOKENS);
const anyToken = fc.oneof(fc.constantFrom(...FORMAT_TOKENS), hostileToken, fc.string({ maxLength: 4 }));
const tokenStream = fc.array(anyToken, { maxLength: 60 }).map((t) => t.join(''));

/** Mutations of a valid file: a changed token, a truncated or repeated line, an insertion, a deletion. */
type Mutation =
  | { kind: 'replace-token'; at: number; by: string }
  | { kind: 'truncate'; at: number }
  | { kind: 'insert'; at: number; text: string }
  | { kind: 'delete'; at: number; length: number }
  | { kind: 'truncate-line'; line: number; at: number }
  | { kind: 'duplicate-line'; line: number }
  | { kind: 'swap-lines'; a: number; b: number };

const position = fc.nat({ max: 10_000 });
const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  { arbitrary: fc.record({ kind: fc.constant('replace-token' as const), at: position, by: fc.oneof(hostileToken, anyToken) }), weight: 4 },
  fc.record({ kind: fc.constant('truncate' as const), at: position }),
  { arbitrary: fc.record({ kind: fc.constant('insert' as const), at: position, text: fc.oneof(hostileToken, anyToken, fc.string({ unit: 'binary', maxLength: 6 })) }), weight: 2 },
  fc.record({ kind: fc.constant('delete' as const), at: position, length: fc.integer({ min: 1, max: 8 }) }),
  fc.record({ kind: fc.constant('truncate-line' as const), line: position, at: position }),
  fc.record({ kind: fc.constant('duplicate-line' as const), line: position }),
  fc.record({ kind: fc.constant('swap-lines' as const), a: position, b: position }),
);

function applyMutation(text: string, m: Mutation): string {
  const at = (k: number, len: number) => (len === 0 ? 0 : k % (len + 1));
  switch (m.kind) {
    case 'replace-token': {
      const tokens = [...text.matchAll(/[^\s,]+/g)];
      if (tokens.length === 0) return m.by + text;
      const t = tokens[m.at % tokens.length]!;
      return text.slice(0, t.index) + m.by + text.slice(t.index + t[0].length);
    }
    case 'truncate':
      return text.slice(0, at(m.at, text.length));
    case 'insert': {
      const p = at(m.at, text.length);
      return text.slice(0, p) + m.text + text.slice(p);
    }
    case 'delete': {
      const p = at(m.at, text.length);
      return text.slice(0, p) + text.slice(p + m.length);
    }
    case 'truncate-line': {
      const lines = text.split('\n');
      const i = m.line % lines.length;
      lines[i] = lines[i]!.slice(0, at(m.at, lines[i]!.length));
      return lines.join('\n');
    }
    case 'duplicate-line': {
      const lines = text.split('\n');
      const i = m.line % lines.length;
      lines.splice(i, 0, lines[i]!);
      return lines.join('\n');
    }
    case 'swap-lines': {
      const lines = text.split('\n');
      const a = m.a % lines.length;
      const b = m.b % lines.length;
      [lines[a], lines[b]] = [lines[b]!, lines[a]!];
      return lines.join('\n');
    }
  }
}

/** A small graph, so a file that still parses after mutation builds in microseconds. */
const smallGraph: fc.Arbitrary<Graph> = fc
  .integer({ min: 1, max: 9 })
  .chain((n) => fc.tuple(fc.constant(n), fc.array(fc.tuple(fc.nat({ max: n - 1 }), fc.nat({ max: n - 1 })), { maxLength: 14 })))
  .map(([n, pairs]) => {
    const seen = new Set<string>();
    const flat: number[] = [];
    for (const [u, v] of pairs) {
      const key = u < v ? `${u},${v}` : `${v},${u}`;
      if (u === v || seen.has(key)) continue;
      seen.add(key);
      flat.push(u, v);
    }
    return graphFromEdges(n, flat);
  });

/** Bytes that look like text most of the time: a valid file's UTF-8 with some bytes overwritten. */
function mutatedBytes(text: string, edits: Array<[number, number]>): Uint8Array {
  const bytes = new TextEncoder().encode(text);
  for (const [p, b] of edits) if (bytes.length > 0) bytes[p % bytes.length] = b;
  return bytes;
}
const byteEdits = fc.array(fc.tuple(position, fc.integer({ min: 0, max: 255 })), { minLength: 1, maxLength: 4 });

/**
 * The inputs for one reader: arbitrary strings (code points and UTF-16 units), arbitrary bytes, format
 * token streams, and a valid file written by the engine's own writer, mutated 1-3 times (as text or bytes).
 */
/**
 * A number in 100000..MAX_VERTICES is a vertex id (or count) a reader must accept, so a 20-byte file with
 * one (say `0 9007199`, a truncated 2^53) is a valid graph of millions of vertices: correct, but seconds of
 * building per case. Such inputs are left out here to keep each valid parse small and fast; the
 * refusals of ids and counts beyond the limits (8+ digits, 2^31, 2^53, 10^30...) stay in.
 */
function noLargeValidNumber(input: TextInput): boolean {
  const text = typeof input === 'string' ? input : new TextDecoder().decode(input);
  for (const m of text.matchAll(/\d{6,8}/g)) {
    const value = Number(m[0]);
    if (value >= 100_000 && value <= MAX_VERTICES) return false;
  }
  return true;
}

function readerInput(validFile: fc.Arbitrary<string>): fc.Arbitrary<TextInput> {
  const mutated = fc.tuple(validFile, fc.array(mutation, { minLength: 1, maxLength: 3 })).map(([text, ms]) => ms.reduce(applyMutation, text));
  return fc.oneof(
    { arbitrary: fc.string({ unit: 'binary', maxLength: 120 }), weight: 1 },
    { arbitrary: fc.string({ unit: fc.integer({ min: 0, max: 0xffff }).map((c) => String.fromCharCode(c)), maxLength: 60 }), weight: 1 },
    { arbitrary: fc.uint8Array({ maxLength: 120 }), weight: 1 },
    { arbitrary: tokenStream, weight: 2 },
    { arbitrary: mutated, weight: 6 },
    { arbitrary: fc.tuple(validFile, byteEdits).map(([t, e]) => mutatedBytes(t, e)), weight: 1 },
  ).filter(noLargeValidNumber);
}

// ---------------------------------------------------------------------------------------------------
// Readers

const edgeListFile = fc.tuple(smallGraph, fc.constantFrom<0 | 1>(0, 1), fc.boolean()).map(([g, base, header]) => writeEdgeList(g, { base, header }));
const dimacsEdgeFile = smallGraph.map((g) => `c a comment\n${writeDimacs(g, { variant: 'edge' })}`);
const dimacsTwFile = smallGraph.map((g) => writeDimacs(g, { variant: 'tw' }));
const matrixMarketFile = fc
  .tuple(smallGraph, fc.constantFrom('pattern symmetric', 'real general', 'integer symmetric', 'pattern general'))
  .map(([g, kind]) => {
    const text = writeMatrixMarket(g);
    if (kind === 'pattern symmetric') return text;
    const hasValue = !kind.startsWith('pattern');
    return text
      .replace('pattern symmetric', kind)
      .split('\n')
      .map((line) => (hasValue && /^\d+ \d+$/.test(line) ? `${line} ${kind.startsWith('real') ? '0.5e-3' : '-2'}` : line))
      .join('\n');
  });
const jsonFile = smallGraph.map((g) => writeJsonGraph(g));
const maskShape = fc
  .tuple(fc.integer({ min: 1, max: 6 }), fc.integer({ min: 1, max: 8 }))
  .chain(([rows, cols]) => fc.tuple(fc.constant(rows), fc.constant(cols), fc.uint8Array({ minLength: rows * cols, maxLength: rows * cols, max: 1 })))
  .map(([rows, cols, present]) => {
    if (!present.includes(1)) present[0] = 1;
    return { rows, cols, present };
  });
const maskFile = maskShape.map((s) => formatMaskText(s));

const readers: Array<{ name: string; input: fc.Arbitrary<TextInput>; read: (input: TextInput) => unknown; graphResult: boolean }> = [
  { name: 'readEdgeList (auto base and header)', input: readerInput(edgeListFile), read: (i) => readEdgeList(i), graphResult: true },
  { name: 'readEdgeList (base 1, header true)', input: readerInput(edgeListFile), read: (i) => readEdgeList(i, { base: 1, header: true }), graphResult: true },
  { name: 'readDimacs (p edge)', input: readerInput(dimacsEdgeFile), read: (i) => readDimacs(i), graphResult: true },
  { name: 'readDimacs (p tw)', input: readerInput(dimacsTwFile), read: (i) => readDimacs(i), graphResult: true },
  { name: 'readMatrixMarket', input: readerInput(matrixMarketFile), read: (i) => readMatrixMarket(i), graphResult: true },
  { name: 'readJsonGraph', input: readerInput(jsonFile), read: (i) => readJsonGraph(i), graphResult: true },
  { name: 'parseMaskText', input: readerInput(maskFile), read: (i) => parseMaskText(i), graphResult: false },
];

describe('engine readers never throw anything but a positioned ParseError', () => {
  for (const r of readers) {
    it(`${r.name}: ${RUNS} arbitrary and mutated inputs`, () => {
      resetTally();
      fc.assert(
        fc.property(r.input, (input) => {
          const outcome = contained(() => r.read(input), 'parse');
          if (r.graphResult) checkRead(outcome);
          else if (outcome.ok) {
            const shape = outcome.value as { rows: number; cols: number; present: Uint8Array };
            expect(shape.present.length).toBe(shape.rows * shape.cols);
            expect(shape.present.includes(1)).toBe(true);
          }
        }),
        params,
      );
      expectBothOutcomes();
    }, PROPERTY_TIMEOUT_MS);
  }

  it('readMatrixMarket on empty input reports a ParseError at line 1, column 1', () => {
    for (const input of ['', '\ufeff', new Uint8Array(0), Uint8Array.from([0xef, 0xbb, 0xbf])]) {
      const err = (() => {
        try {
          readMatrixMarket(input);
        } catch (e) {
          return e;
        }
        return undefined;
      })();
      expect(err).toBeInstanceOf(ParseError);
      expect((err as ParseError).line).toBe(1);
      expect((err as ParseError).column).toBe(1);
    }
  });

  it(`readGraph (format detection over all formats): ${RUNS} inputs`, () => {
    const anyFile = fc.oneof(edgeListFile, dimacsEdgeFile, dimacsTwFile, matrixMarketFile, jsonFile);
    const fileName = fc.constantFrom(undefined, 'g.txt', 'g.mtx', 'g.gr', 'g.col', 'g.edges', 'g.json', 'g', '.json', 'dir/g.el');
    resetTally();
    fc.assert(
      fc.property(readerInput(anyFile), fileName, (input, name) => {
        // readGraph refuses a mask with a plain EngineError ('mask_is_a_shape'), so only 'engine' here.
        checkRead(contained(() => readGraph(input, name === undefined ? {} : { fileName: name }), 'engine'));
      }),
      params,
    );
    expectBothOutcomes();
  }, PROPERTY_TIMEOUT_MS);

  it(`readLabelsCsv (grid, mask with holes, and list graphs): ${RUNS} inputs`, () => {
    const graphs = [gridGraph(3, 4), maskGraph({ rows: 2, cols: 3, present: Uint8Array.from([1, 0, 1, 1, 1, 0]) }), pathGraph(5), graphFromEdges(4, [0, 1, 2, 3])];
    const labelled = fc.integer({ min: 0, max: graphs.length - 1 }).chain((k) =>
      fc.tuple(
        fc.constant(k),
        fc.array(fc.integer({ min: 1, max: 2 ** 31 - 1 }), { minLength: graphs[k]!.vertexCount, maxLength: graphs[k]!.vertexCount }),
      ),
    );
    // The labels file is written for the graph it is read against, then mutated (or replaced by noise).
    const pairListCsv = 'vertex,label\n0,1\n1,2\n2,1\n3,3\n4,1\n';
    const input = labelled.chain(([k, labels]) => {
      const valid = graphs[k]!.layout || k !== 2 ? fc.constant(writeLabelsCsv(graphs[k]!, labels)) : fc.constantFrom(writeLabelsCsv(graphs[k]!, labels), pairListCsv);
      return fc.tuple(fc.constant(k), readerInput(valid));
    });
    resetTally();
    fc.assert(
      fc.property(input, ([k, text]) => {
        const graph = graphs[k]!;
        const outcome = contained(() => readLabelsCsv(text, graph), 'parse');
        if (outcome.ok) {
          const labels = outcome.value as Int32Array;
          expect(labels.length).toBe(graph.vertexCount);
          for (const l of labels) expect(l).toBeGreaterThanOrEqual(1);
        }
      }),
      params,
    );
    expectBothOutcomes();
  }, PROPERTY_TIMEOUT_MS);
});

// ---------------------------------------------------------------------------------------------------
// Specs

const families = [...Object.keys(SPEC_FAMILIES), 'file', 'upload', 'Grid', 'grid ', 'gird', 'x', 'a-', '-'];
/** Small sizes (a spec that parses must build quickly), or hostile text in the place of a number. */
const specNumber = fc.oneof({ arbitrary: fc.integer({ min: 0, max: 40 }).map(String), weight: 4 }, { arbitrary: hostileToken, weight: 2 }, fc.constantFrom('0.3', '1e-2', ' 4 ', '', '3x', 'x'));
const specBody = fc.oneof(
  specNumber,
  fc.tuple(specNumber, fc.constantFrom('x', '×', 'X', '*', 'xx', ' x '), specNumber).map((t) => t.join('')),
  fc.tuple(specNumber, specNumber).map(([a, b]) => `${a}:${b}`),
  fc.tuple(specNumber, fc.constantFrom('0', '0.1', '1', '1.0000001', '-0.1', 'NaN', '.5', '1e-9'), specNumber).map(([n, p, s]) => `${n}:${p}:${s}`),
  fc.string({ maxLength: 12 }),
);
const structuredSpec = fc
  .tuple(fc.constantFrom(...families), fc.constantFrom(':', ':', '::', ' :', ''), specBody, fc.array(mutation, { maxLength: 1 }))
  .map(([family, colon, body, ms]) => ms.reduce(applyMutation, `${family}${colon}${body}`));
const specText: fc.Arbitrary<string> = fc.oneof(
  { arbitrary: structuredSpec, weight: 6 },
  { arbitrary: fc.string({ unit: 'binary', maxLength: 40 }), weight: 1 },
  { arbitrary: fc.string({ unit: fc.integer({ min: 0, max: 0xffff }).map((c) => String.fromCharCode(c)), maxLength: 20 }), weight: 1 },
  { arbitrary: fc.constantFrom('grid:31623x31623', 'grid:10000001x1', 'complete:14143', 'staircase:4472', 'path:99999999999999999999', 'gnp:5:2:1', 'random-tree:3:-1', 'torus:2x2', 'cycle:2'), weight: 1 },
).filter(noLargeValidNumber);

/** File contents a spec's loader may hand back: any reader's input, a parent array, or mask text. */
const parentArrayFile = fc
  .integer({ min: 1, max: 9 })
  .chain((n) => fc.array(fc.integer({ min: -1, max: n - 1 }), { minLength: n, maxLength: n }))
  .map((parents) => parents.join(' '));
const loaderContent = readerInput(fc.oneof(edgeListFile, dimacsEdgeFile, matrixMarketFile, jsonFile, maskFile, parentArrayFile));

describe('spec parsing and building never throw anything but an EngineError', () => {
  it(`parseGraphSpec: ${RUNS} arbitrary and near-valid specs`, () => {
    resetTally();
    fc.assert(
      fc.property(specText, (text) => {
        const outcome = contained(() => parseGraphSpec(text), 'engine');
        if (outcome.ok) expect(typeof (outcome.value as GraphSpec).family).toBe('string');
      }),
      params,
    );
    expectBothOutcomes();
  }, PROPERTY_TIMEOUT_MS);

  it(`graphFromSpec (text specs, files through a loader): ${RUNS} cases`, () => {
    const fileSpec = fc.tuple(fc.constantFrom('mask:', 'tree:', ''), fc.constantFrom('g.json', 'g.mtx', 'g.gr', 'g.edges', 'g.mask', 'g.txt', 'g', 'parents.txt')).map(([p, f]) => p + f);
    resetTally();
    fc.assert(
      fc.property(fc.oneof(specText, fileSpec), loaderContent, fc.boolean(), (text, content, withLoader) => {
        const outcome = contained(() => graphFromSpec(text, withLoader ? () => content : undefined), 'engine');
        if (outcome.ok) {
          const g = outcome.value as Graph;
          expect(g).toBeInstanceOf(Graph);
          expect(g.vertexCount).toBeLessThanOrEqual(2_000_000);
        }
      }),
      params,
    );
    expectBothOutcomes();
  }, PROPERTY_TIMEOUT_MS);

  it(`graphFromSpec (spec objects with hostile numbers): ${RUNS} cases`, () => {
    const num = fc.oneof(
      { arbitrary: fc.integer({ min: -3, max: 25 }), weight: 5 },
      fc.constantFrom(Number.NaN, Infinity, -Infinity, 1.5, -0, 2 ** 31, 2 ** 32, 2 ** 53, 2 ** 53 + 2, 1e300, -1e300, Number.MIN_VALUE, 10_000_001),
    );
    const prob = fc.oneof(fc.double({ noNaN: false }), fc.constantFrom(0, 0.2, 1));
    const spec: fc.Arbitrary<GraphSpec> = fc.oneof(
      fc.record({ family: fc.constantFrom('grid' as const, 'cylinder' as const, 'torus' as const), rows: num, cols: num }),
      fc.record({ family: fc.constant('staircase' as const), t: num }),
      fc.record({ family: fc.constantFrom('path' as const, 'cycle' as const, 'complete' as const), n: num }),
      fc.record({ family: fc.constant('bipartite' as const), a: num, b: num }),
      fc.record({ family: fc.constant('star' as const), leaves: num }),
      fc.record({ family: fc.constant('random-tree' as const), n: num, seed: num }),
      fc.record({ family: fc.constant('gnp' as const), n: num, p: prob, seed: num }),
      fc.record({ family: fc.constant('mask' as const), text: fc.oneof(maskFile, tokenStream, fc.string({ unit: 'binary', maxLength: 30 })) }, { requiredKeys: ['family'] }),
      fc.record({ family: fc.constant('tree' as const), parents: fc.array(num, { maxLength: 12 }) }, { requiredKeys: ['family'] }),
      fc.record({ family: fc.constant('file' as const), file: fc.constantFrom('g.json', 'g.mtx', 'g.txt', 'g.mask'), format: fc.constantFrom(undefined, 'json', 'dimacs', 'mask', 'edge-list', 'matrix-market', 'pdf', '') }).map((s) => {
        const { format, ...rest } = s;
        return format === undefined ? rest : { ...rest, format };
      }),
    );
    resetTally();
    fc.assert(
      fc.property(spec, loaderContent, (s, content) => {
        const outcome = contained(() => graphFromSpec(s, () => content), 'engine');
        if (outcome.ok) expect(outcome.value).toBeInstanceOf(Graph);
      }),
      params,
    );
    expectBothOutcomes();
  }, PROPERTY_TIMEOUT_MS);

  // randomGraph must refuse an n beyond the vertex limit before it walks the vertices (it once looped n times).
  it('graphFromSpec gnp with n beyond MAX_VERTICES and a tiny p is refused with a SizeError', () => {
    expect(() => graphFromSpec({ family: 'gnp', n: 2 ** 53, p: 1e-300, seed: 1 })).toThrow(EngineError);
    expect(() => randomGraph(2 ** 32, 5e-324, 1)).toThrow(EngineError);
  });
});
