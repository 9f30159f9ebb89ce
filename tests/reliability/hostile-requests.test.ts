// Bad input, part 2: a corpus of hostile API requests against the built server. Every one must be
// answered with a 4xx in the JSON error shape { error: { code, message } } (never a 5xx, never a hang),
// the server must stay healthy, and nothing may be half-written: the row counts of runs, sweeps and graphs
// (and the other tables) are the same after the corpus as before it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { createDataSource, createLogger, Database, loadDemoData } from '@cairn/server';
import { startBuiltServer, type BuiltServer } from '../support/built-server';
import { databaseUrl } from '../support/test-env';

const SQL = "'; DROP TABLE runs; --";
const SQL_GRAPHS = "x'); DELETE FROM graphs; --";
const UNICODE = 'grïd\u202e:４x４ 🙂 \u0000 \ud800 ١٢';
/** The same without U+0000, for fields where it is legal text (NUL has cases of its own). */
const UNICODE_TEXT = UNICODE.replace('\u0000', '');
const TABLES = ['runs', 'sweeps', 'graphs', 'atlas_entries', 'users', 'api_keys'] as const;
const REQUEST_TIMEOUT_MS = 30_000;
/** Uploads are capped low here so an oversize upload is cheap to send. */
const UPLOAD_LIMIT_MB = 1;

let server: BuiltServer;
let key: string;
let db: pg.Client;
let runId: string;
let before: Record<string, number>;

async function countRows(): Promise<Record<string, number>> {
  const counts: Record<string, number> = {};
  for (const t of TABLES) counts[t] = Number((await db.query(`SELECT count(*)::int AS n FROM ${t}`)).rows[0].n);
  return counts;
}

interface Answer {
  status: number;
  contentType: string;
  text: string;
}

/** A request body: text, or bytes (a Buffer is bytes too, though TypeScript's fetch types do not say so). */
type Body = BodyInit | Buffer;

async function send(method: string, path: string, init: { body?: Body; headers?: Record<string, string>; auth?: boolean } = {}): Promise<Answer> {
  const headers: Record<string, string> = { ...(init.auth === false ? {} : { authorization: `Bearer ${key}` }), ...init.headers };
  const res = await fetch(`${server.url}${path}`, { method, headers, body: (init.body ?? null) as BodyInit | null, signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS) });
  return { status: res.status, contentType: res.headers.get('content-type') ?? '', text: await res.text() };
}

const json = (value: unknown) => ({ body: JSON.stringify(value), headers: { 'content-type': 'application/json' } });
const raw = (body: Body, contentType = 'application/json', extra: Record<string, string> = {}) => ({ body, headers: { 'content-type': contentType, ...extra } });
const nestedArrays = (depth: number) => '['.repeat(depth) + ']'.repeat(depth);
const nestedObjects = (depth: number, leaf = '1') => '{"spec":'.repeat(depth) + leaf + '}'.repeat(depth);
const q = (params: Record<string, string>) => new URLSearchParams(params).toString();

/** A multipart form built by hand, for the malformed ones fetch's FormData would never send. */
function multipart(parts: Array<{ name: string; filename?: string; type?: string; content: string | Buffer }>, boundary = 'cairnBoundary7MA4YWxkTrZu0gW', close = true): { body: Buffer; headers: Record<string, string> } {
  const chunks: Buffer[] = [];
  for (const p of parts) {
    const disposition = `form-data; name="${p.name}"${p.filename === undefined ? '' : `; filename="${p.filename}"`}`;
    chunks.push(Buffer.from(`--${boundary}\r\nContent-Disposition: ${disposition}\r\n${p.type ? `Content-Type: ${p.type}\r\n` : ''}\r\n`));
    chunks.push(Buffer.isBuffer(p.content) ? p.content : Buffer.from(p.content));
    chunks.push(Buffer.from('\r\n'));
  }
  if (close) chunks.push(Buffer.from(`--${boundary}--\r\n`));
  return { body: Buffer.concat(chunks), headers: { 'content-type': `multipart/form-data; boundary=${boundary}` } };
}

function form(fields: Record<string, string>, file?: { content: BlobPart; name: string; field?: string }): FormData {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.append(k, v);
  if (file) f.append(file.field ?? 'file', new Blob([file.content]), file.name);
  return f;
}

/** Bytes that are no graph file: NULs, invalid UTF-8, a PNG header. */
function binaryBytes(): Uint8Array<ArrayBuffer> {
  const b = Buffer.alloc(4096);
  for (let i = 0; i < b.length; i++) b[i] = (i * 131 + 17) % 256;
  return Uint8Array.from(Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), b]));
}

type Case = {
  name: string;
  method: string;
  path: string | (() => string);
  init?: Parameters<typeof send>[2] | (() => Parameters<typeof send>[2]);
  /** A known server bug this case exposes: the case is skipped and the bug named in its title. */
  bug?: string;
};

const goodRun = { spec: 'path:5' };

const runCases: Case[] = [
  { name: 'malformed JSON: unterminated object', method: 'POST', path: '/api/v1/runs', init: raw('{"spec": "path:5"') },
  { name: 'malformed JSON: single quotes', method: 'POST', path: '/api/v1/runs', init: raw("{'spec': 'path:5'}") },
  { name: 'malformed JSON: trailing comma', method: 'POST', path: '/api/v1/runs', init: raw('{"spec": "path:5",}') },
  { name: 'malformed JSON: NaN literal', method: 'POST', path: '/api/v1/runs', init: raw('{"spec": "path:5", "timeLimitSeconds": NaN}') },
  { name: 'malformed JSON: invalid UTF-8 bytes', method: 'POST', path: '/api/v1/runs', init: raw(Buffer.from([0x7b, 0x22, 0x73, 0x70, 0x65, 0x63, 0x22, 0x3a, 0x22, 0xc3, 0x28, 0xff, 0xfe, 0x22, 0x7d])) },
  { name: 'malformed JSON: a NUL byte inside', method: 'POST', path: '/api/v1/runs', init: raw('{"spec": "path:5"\u0000}') },
  { name: 'empty JSON body', method: 'POST', path: '/api/v1/runs', init: raw('') },
  { name: 'JSON null', method: 'POST', path: '/api/v1/runs', init: raw('null') },
  { name: 'JSON array', method: 'POST', path: '/api/v1/runs', init: raw('[{"spec": "path:5"}]') },
  { name: 'JSON string', method: 'POST', path: '/api/v1/runs', init: raw('"path:5"') },
  { name: 'JSON number', method: 'POST', path: '/api/v1/runs', init: raw('42') },
  { name: 'a valid body sent as text/plain', method: 'POST', path: '/api/v1/runs', init: raw(JSON.stringify(goodRun), 'text/plain') },
  { name: 'a valid body sent as form-urlencoded', method: 'POST', path: '/api/v1/runs', init: raw('spec=path:5', 'application/x-www-form-urlencoded') },
  { name: 'a valid body declared as UTF-16', method: 'POST', path: '/api/v1/runs', init: raw(JSON.stringify(goodRun), 'application/json; charset=utf-16') },
  { name: 'a garbage gzip body', method: 'POST', path: '/api/v1/runs', init: raw(Buffer.from('not gzip at all'), 'application/json', { 'content-encoding': 'gzip' }) },
  { name: 'an unknown content encoding', method: 'POST', path: '/api/v1/runs', init: raw(JSON.stringify(goodRun), 'application/json', { 'content-encoding': 'x-cairn-rot13' }) },
  { name: 'nested JSON 10,000 levels (arrays)', method: 'POST', path: '/api/v1/runs', init: raw(nestedArrays(10_000)) },
  { name: 'nested JSON 10,000 levels (spec objects)', method: 'POST', path: '/api/v1/runs', init: raw(nestedObjects(10_000)) },
  { name: 'nested JSON 100,000 levels (spec objects)', method: 'POST', path: '/api/v1/runs', init: raw(nestedObjects(100_000)) },
  { name: 'oversize body (2 MB, over the 1 MB limit)', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', pad: 'x'.repeat(2 * 1024 * 1024) }) },
  { name: 'spec: a 10^9-vertex grid grid:31623x31623', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'grid:31623x31623' }) },
  { name: 'spec: JSON grid of 31623 x 31623', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'grid', rows: 31623, cols: 31623 } }) },
  { name: 'spec: grid with 10^18 rows', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'grid:1000000000000000000x1' }) },
  { name: 'spec: negative sizes grid:-4x9', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'grid:-4x9' }) },
  { name: 'spec: JSON grid with negative rows', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'grid', rows: -4, cols: 9 } }) },
  { name: 'spec: JSON grid with fractional rows', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'grid', rows: 4.5, cols: 9 } }) },
  { name: 'spec: JSON grid with rows as a string', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'grid', rows: '4', cols: 9 } }) },
  { name: 'spec: JSON grid with rows 1e309 (Infinity)', method: 'POST', path: '/api/v1/runs', init: raw('{"spec": {"family": "grid", "rows": 1e309, "cols": 9}}') },
  { name: 'spec: complete:14143 (more edges than a graph may hold)', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'complete:14143' }) },
  { name: 'spec: staircase:4472', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'staircase:4472' }) },
  { name: 'spec: path:0', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:0' }) },
  { name: 'spec: gnp with p = 2', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'gnp:10:2:1' }) },
  { name: 'spec: JSON gnp with n = 2^53', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'gnp', n: 2 ** 53, p: 1e-300, seed: 1 } }) },
  { name: 'spec: JSON tree with a cycle of parents', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'tree', parents: [1, 0] } }) },
  { name: 'spec: JSON tree with a parent out of range', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'tree', parents: [-1, 7] } }) },
  { name: 'spec: JSON mask of only holes', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'mask', text: '...\n...\n' } }) },
  { name: 'spec: JSON mask with ragged rows', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'mask', text: '###\n#\n' } }) },
  { name: 'spec: an unknown JSON family', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: SQL, n: 5 } }) },
  { name: 'spec: SQL text', method: 'POST', path: '/api/v1/runs', init: json({ spec: SQL }) },
  { name: 'spec: unicode text', method: 'POST', path: '/api/v1/runs', init: json({ spec: UNICODE }) },
  { name: 'spec: fullwidth digits grid:４x４', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'grid:４x４' }) },
  { name: 'spec: a server file /etc/passwd', method: 'POST', path: '/api/v1/runs', init: json({ spec: '/etc/passwd' }) },
  { name: 'spec: mask of a server file', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'mask:../../../etc/passwd' }) },
  { name: 'spec: 201 characters', method: 'POST', path: '/api/v1/runs', init: json({ spec: `path:${'1'.repeat(196)}` }) },
  { name: 'spec: empty string', method: 'POST', path: '/api/v1/runs', init: json({ spec: '' }) },
  { name: 'spec: a number', method: 'POST', path: '/api/v1/runs', init: json({ spec: 5 }) },
  { name: 'spec: null', method: 'POST', path: '/api/v1/runs', init: json({ spec: null }) },
  { name: 'spec: an array', method: 'POST', path: '/api/v1/runs', init: json({ spec: ['path:5'] }) },
  { name: 'spec and graphId together', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', graphId: '00000000-0000-4000-8000-000000000000' }) },
  { name: 'neither spec nor graphId', method: 'POST', path: '/api/v1/runs', init: json({ method: 'auto' }) },
  { name: 'graphId: SQL', method: 'POST', path: '/api/v1/runs', init: json({ graphId: SQL }) },
  { name: 'graphId: a UUID of no graph', method: 'POST', path: '/api/v1/runs', init: json({ graphId: '6f1c3a52-8d1e-4c1f-9b7a-2f1f1f1f1f1f' }) },
  { name: 'spec: JSON upload of no graph', method: 'POST', path: '/api/v1/runs', init: json({ spec: { family: 'upload', graphId: '6f1c3a52-8d1e-4c1f-9b7a-2f1f1f1f1f1f' } }) },
  { name: 'method: SQL', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', method: SQL }) },
  { name: 'method: unicode', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', method: 'éxact' }) },
  { name: 'method: a number', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', method: 3 }) },
  { name: 'timeLimitSeconds: negative', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', timeLimitSeconds: -60 }) },
  { name: 'timeLimitSeconds: zero', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', timeLimitSeconds: 0 }) },
  { name: 'timeLimitSeconds: 10^12', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', timeLimitSeconds: 1e12 }) },
  { name: 'timeLimitSeconds: fractional', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', timeLimitSeconds: 1.5 }) },
  { name: 'timeLimitSeconds: a string', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', timeLimitSeconds: '60' }) },
  { name: 'visibility: SQL', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', visibility: SQL }) },
  { name: 'an unknown key', method: 'POST', path: '/api/v1/runs', init: json({ spec: 'path:5', owner: 'admin' }) },
  { name: 'a __proto__ key', method: 'POST', path: '/api/v1/runs', init: raw('{"spec": "path:5", "__proto__": {"role": "admin"}}') },
  { name: 'a constructor.prototype key', method: 'POST', path: '/api/v1/runs', init: raw('{"spec": "path:5", "constructor": {"prototype": {"role": "admin"}}}') },
  { name: 'no Authorization header', method: 'POST', path: '/api/v1/runs', init: { ...json(goodRun), auth: false } },
  { name: 'a malformed Authorization header', method: 'POST', path: '/api/v1/runs', init: { ...json(goodRun), auth: false, headers: { 'content-type': 'application/json', authorization: `Basic ${SQL}` } } },
  { name: 'an unknown key of 8 KB', method: 'POST', path: '/api/v1/runs', init: { ...json(goodRun), auth: false, headers: { 'content-type': 'application/json', authorization: `Bearer cairn_${'a'.repeat(8000)}` } } },
  { name: 'an SQL key', method: 'POST', path: '/api/v1/runs', init: { ...json(goodRun), auth: false, headers: { 'content-type': 'application/json', authorization: `Bearer ${SQL.replaceAll(' ', '')}` } } },
];

const sweep = { family: 'grid', rows: { from: 2, to: 3 }, cols: { from: 2, to: 3 } };
const sweepCases: Case[] = [
  { name: 'malformed JSON', method: 'POST', path: '/api/v1/sweeps', init: raw('{"family": "grid", "rows": {') },
  { name: 'JSON array', method: 'POST', path: '/api/v1/sweeps', init: raw('[]') },
  { name: 'nested JSON 10,000 levels', method: 'POST', path: '/api/v1/sweeps', init: raw(`{"family":"grid","rows":${nestedObjects(10_000)},"cols":{"from":1,"to":2}}`) },
  { name: 'oversize body (2 MB)', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, name: 'x'.repeat(2 * 1024 * 1024) }) },
  { name: 'family: SQL', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, family: SQL }) },
  { name: 'family: unicode', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, family: UNICODE }) },
  { name: 'family: a number', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, family: 7 }) },
  { name: 'rows: negative', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, rows: { from: -5, to: 3 } }) },
  { name: 'rows: to 10^9', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, rows: { from: 1, to: 1e9 } }) },
  { name: 'rows: from > to', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, rows: { from: 9, to: 3 } }) },
  { name: 'rows: strings', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, rows: { from: '1', to: '3' } }) },
  { name: 'rows: a number, not a range', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, rows: 3 }) },
  { name: 'rows: fractional', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, rows: { from: 1.5, to: 3 } }) },
  { name: 'rows x cols: 1000 x 1000 cells (over the 400-cell limit)', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, rows: { from: 1, to: 1000 }, cols: { from: 1, to: 1000 } }) },
  { name: 'rows x cols: 21 x 20 cells (just over the limit)', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, rows: { from: 1, to: 21 }, cols: { from: 1, to: 20 } }) },
  { name: 'name: SQL with a bad range', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, name: SQL, rows: { from: 0, to: 3 } }) },
  { name: 'name: unicode with a bad family', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, name: UNICODE, family: 'gird' }) },
  { name: 'name: 121 characters', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, name: 'n'.repeat(121) }) },
  { name: 'name: only spaces', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, name: '   ' }) },
  { name: 'method: SQL', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, method: SQL }) },
  { name: 'timeLimitSeconds: negative', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, timeLimitSeconds: -1 }) },
  { name: 'visibility: unicode', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, visibility: 'pübl1c' }) },
  { name: 'an unknown key', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, cells: [[1, 1]] }) },
];

const verifyCases: Case[] = [
  { name: 'malformed JSON', method: 'POST', path: '/api/v1/verify', init: raw('{"spec": "path:3", "labels": [1, 2, 1') },
  { name: 'empty body', method: 'POST', path: '/api/v1/verify', init: raw('') },
  { name: 'nested JSON 10,000 levels in labels', method: 'POST', path: '/api/v1/verify', init: raw(`{"spec":"path:3","labels":${nestedArrays(10_000)}}`) },
  { name: 'nested JSON 1,000,000 levels (2 MB, under its 32 MB limit)', method: 'POST', path: '/api/v1/verify', init: raw(nestedArrays(1_000_000)) },
  { name: 'nested JSON 100,000 levels in spec', method: 'POST', path: '/api/v1/verify', init: raw(`{"labels":[1],"spec":${nestedObjects(100_000, '"path:1"')}}`) },
  { name: 'oversize body (33 MB, over its 32 MB limit)', method: 'POST', path: '/api/v1/verify', init: () => raw(`{"spec":"path:3","labels":[${'1,'.repeat(17 * 1024 * 1024)}1]}`) },
  { name: 'spec: a 10^9-vertex grid grid:31623x31623', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'grid:31623x31623', labels: [1] }) },
  { name: 'spec: JSON grid of 31623 x 31623', method: 'POST', path: '/api/v1/verify', init: json({ spec: { family: 'grid', rows: 31623, cols: 31623 }, labels: [1] }) },
  { name: 'spec: 9 million vertices, over the verify limit, with one label', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'grid:3000x3000', labels: [1] }) },
  { name: 'spec: SQL', method: 'POST', path: '/api/v1/verify', init: json({ spec: SQL, labels: [1] }) },
  { name: 'spec: unicode', method: 'POST', path: '/api/v1/verify', init: json({ spec: UNICODE, labels: [1] }) },
  { name: 'spec: a server file', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'tree:/etc/hostname', labels: [1] }) },
  { name: 'labels: too few', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'path:5', labels: [1, 2] }) },
  { name: 'labels: too many', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'path:2', labels: [1, 2, 3, 4] }) },
  { name: 'labels: negative, zero and fractional', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'path:3', labels: [-1, 0, 1.5] }) },
  { name: 'labels: beyond 2^31', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'path:3', labels: [1, 2 ** 31, 2 ** 53] }) },
  { name: 'labels: 1e309 (Infinity)', method: 'POST', path: '/api/v1/verify', init: raw('{"spec":"path:3","labels":[1,1e309,1]}') },
  { name: 'labels: strings', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'path:3', labels: ['1', '2', SQL] }) },
  { name: 'labels: an object', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'path:3', labels: { 0: 1 } }) },
  { name: 'labels: missing', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'path:3' }) },
  { name: 'graphId: SQL', method: 'POST', path: '/api/v1/verify', init: json({ graphId: SQL, labels: [1] }) },
  { name: 'graphId: a UUID of no graph', method: 'POST', path: '/api/v1/verify', init: json({ graphId: '6f1c3a52-8d1e-4c1f-9b7a-2f1f1f1f1f1f', labels: [1] }) },
  { name: 'spec and graphId together', method: 'POST', path: '/api/v1/verify', init: json({ spec: 'path:1', graphId: '6f1c3a52-8d1e-4c1f-9b7a-2f1f1f1f1f1f', labels: [1] }) },
];

const validEdgeList = '0 1\n1 2\n';
const graphCases: Case[] = [
  { name: 'JSON instead of multipart', method: 'POST', path: '/api/v1/graphs', init: json({ file: validEdgeList }) },
  { name: 'no body at all', method: 'POST', path: '/api/v1/graphs' },
  { name: 'a form without a file', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({ name: 'g' }) }) },
  { name: 'the file in the wrong field', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: validEdgeList, name: 'g.txt', field: 'upload' }) }) },
  { name: 'two files', method: 'POST', path: '/api/v1/graphs', init: () => multipart([{ name: 'file', filename: 'a.txt', content: validEdgeList }, { name: 'file', filename: 'b.txt', content: validEdgeList }]) },
  { name: 'multipart without a boundary', method: 'POST', path: '/api/v1/graphs', init: raw(validEdgeList, 'multipart/form-data') },
  { name: 'multipart cut off before its closing boundary', method: 'POST', path: '/api/v1/graphs', init: () => multipart([{ name: 'file', filename: 'g.txt', content: validEdgeList }], undefined, false) },
  { name: 'multipart of garbage', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: binaryBytes(), headers: { 'content-type': 'multipart/form-data; boundary=xyz' } }) },
  { name: 'too many parts', method: 'POST', path: '/api/v1/graphs', init: () => multipart([...Array.from({ length: 8 }, (_, i) => ({ name: `f${i}`, content: 'x' })), { name: 'file', filename: 'g.txt', content: validEdgeList }]) },
  { name: 'a field value over 1 KB', method: 'POST', path: '/api/v1/graphs', init: () => multipart([{ name: 'name', content: 'n'.repeat(2048) }, { name: 'file', filename: 'g.txt', content: validEdgeList }]) },
  { name: 'binary upload (PNG header, NUL bytes)', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: binaryBytes(), name: 'picture.png' }) }) },
  { name: 'binary upload named .json', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: binaryBytes(), name: 'g.json' }) }) },
  { name: 'invalid UTF-8 without NUL', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: Buffer.from([0x30, 0x20, 0x31, 0x0a, 0xc3, 0x28, 0x20, 0x32, 0x0a]), name: 'g.txt' }) }) },
  { name: 'oversize upload (1.5 MB over a 1 MB limit)', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '0 1\n'.repeat(400_000), name: 'big.txt' }) }) },
  { name: 'an empty file', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '', name: 'empty.txt' }) }) },
  { name: 'DIMACS with 10^9 vertices', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: 'p edge 1000000000 1\ne 1 2\n', name: 'g.gr' }) }) },
  { name: 'DIMACS with negative sizes', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: 'p edge -5 -1\n', name: 'g.gr' }) }) },
  { name: 'edge list with an id of 10^20', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '0 100000000000000000000\n', name: 'g.txt' }) }) },
  { name: 'edge list with a negative id', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '0 -1\n', name: 'g.edges' }) }) },
  { name: 'JSON graph with vertexCount 10^9', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '{"vertexCount": 1000000000, "edges": []}', name: 'g.json' }) }) },
  { name: 'JSON graph nested 10,000 levels', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: nestedArrays(10_000), name: 'g.json' }) }) },
  { name: 'Matrix Market not square', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '%%MatrixMarket matrix coordinate pattern symmetric\n3 4 1\n2 1\n', name: 'g.mtx' }) }) },
  { name: 'Matrix Market truncated', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '%%MatrixMarket matrix coordinate pattern symmetric\n3 3 5\n2 1\n', name: 'g.mtx' }) }) },
  { name: 'Matrix Market empty file', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '', name: 'g.mtx' }) }) },
  { name: 'a mask of only holes', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '...\n...\n', name: 'g.mask' }) }) },
  { name: 'format: SQL', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({ format: SQL_GRAPHS }, { content: validEdgeList, name: 'g.txt' }) }) },
  { name: 'format: unicode', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({ format: 'édge-list' }, { content: validEdgeList, name: 'g.txt' }) }) },
  { name: 'name: SQL with content that is no graph', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({ name: SQL_GRAPHS }, { content: 'p edge x y\n', name: 'g.gr' }) }) },
  { name: 'name: 201 characters', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({ name: 'n'.repeat(201) }, { content: validEdgeList, name: 'g.txt' }) }) },
  { name: 'file name: SQL and unicode with content that is no graph', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: '{"vertexCount": -1, "edges": []}', name: `${SQL}🙂\u202e.json` }) }) },
  { name: 'file name: a path traversal with content that is no graph', method: 'POST', path: '/api/v1/graphs', init: () => ({ body: form({}, { content: binaryBytes(), name: '../../../../etc/passwd' }) }) },
];

const aUuid = '6f1c3a52-8d1e-4c1f-9b7a-2f1f1f1f1f1f';
const patchCases: Case[] = [
  { name: 'id: not a UUID', method: 'PATCH', path: '/api/v1/runs/not-a-uuid', init: json({ visibility: 'public' }) },
  { name: 'id: SQL', method: 'PATCH', path: `/api/v1/runs/${encodeURIComponent(SQL)}`, init: json({ visibility: 'public' }) },
  { name: 'id: SQL with a quote kept raw', method: 'PATCH', path: "/api/v1/runs/1'%20OR%20'1'='1", init: json({ visibility: 'public' }) },
  { name: 'id: unicode', method: 'PATCH', path: `/api/v1/runs/${encodeURIComponent('ü🙂\u202e')}`, init: json({ visibility: 'public' }) },
  { name: 'id: a NUL byte', method: 'PATCH', path: '/api/v1/runs/%00', init: json({ visibility: 'public' }) },
  { name: 'id: broken percent-encoding', method: 'PATCH', path: '/api/v1/runs/%E0%A4%A', init: json({ visibility: 'public' }) },
  { name: 'id: 10,000 characters', method: 'PATCH', path: `/api/v1/runs/${'a'.repeat(10_000)}`, init: json({ visibility: 'public' }) },
  { name: 'id: a UUID with a trailing character', method: 'PATCH', path: `/api/v1/runs/${aUuid}0`, init: json({ visibility: 'public' }) },
  { name: 'id: a UUID of no run', method: 'PATCH', path: `/api/v1/runs/${aUuid}`, init: json({ visibility: 'public' }) },
  { name: 'body: malformed JSON', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: raw('{"visibility": ') },
  { name: 'body: visibility SQL', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: json({ visibility: SQL }) },
  { name: 'body: visibility unicode', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: json({ visibility: 'pub\u0000lic' }) },
  { name: 'body: visibility a number', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: json({ visibility: 1 }) },
  { name: 'body: visibility missing', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: json({}) },
  { name: 'body: an unknown key', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: json({ visibility: 'public', status: 'done' }) },
  { name: 'body: JSON array', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: raw('["public"]') },
  { name: 'body: nested 10,000 levels', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: raw(`{"visibility":${nestedArrays(10_000)}}`) },
  { name: 'body: oversize (2 MB)', method: 'PATCH', path: () => `/api/v1/runs/${runId}`, init: json({ visibility: 'x'.repeat(2 * 1024 * 1024) }) },
];

const listCases: Case[] = [
  { name: 'limit: negative', method: 'GET', path: `/api/v1/runs?${q({ limit: '-1' })}` },
  { name: 'limit: 10^9', method: 'GET', path: `/api/v1/runs?${q({ limit: '1000000000' })}` },
  { name: 'limit: not a number', method: 'GET', path: `/api/v1/runs?${q({ limit: SQL })}` },
  { name: 'limit: twice', method: 'GET', path: '/api/v1/runs?limit=1&limit=2' },
  { name: 'limit: as an object (limit[a]=1)', method: 'GET', path: '/api/v1/runs?limit[a]=1' },
  { name: 'offset: negative', method: 'GET', path: `/api/v1/runs?${q({ offset: '-5' })}` },
  { name: 'offset: 10^30', method: 'GET', path: `/api/v1/runs?${q({ offset: '1e30' })}` },
  { name: 'status: SQL', method: 'GET', path: `/api/v1/runs?${q({ status: SQL })}` },
  { name: 'status: unicode', method: 'GET', path: `/api/v1/runs?${q({ status: 'dоne' })}` },
  { name: 'family: 41 characters', method: 'GET', path: `/api/v1/runs?${q({ family: 'f'.repeat(41) })}` },
  { name: 'owner: 101 characters', method: 'GET', path: `/api/v1/runs?${q({ owner: 'o'.repeat(101) })}` },
  { name: 'sweepId: SQL', method: 'GET', path: `/api/v1/runs?${q({ sweepId: SQL })}` },
  { name: 'cursor: 201 characters', method: 'GET', path: `/api/v1/runs?${q({ cursor: 'c'.repeat(201) })}` },
  { name: 'an unknown parameter', method: 'GET', path: `/api/v1/runs?${q({ orderBy: SQL })}` },
  { name: 'broken percent-encoding', method: 'GET', path: '/api/v1/runs?status=%E0%A4%A' },
  { name: 'atlas rows: negative', method: 'GET', path: `/api/v1/atlas?${q({ rows: '-4' })}` },
  { name: 'atlas rows: 10^400', method: 'GET', path: `/api/v1/atlas?${q({ rows: `1${'0'.repeat(400)}` })}` },
  { name: 'atlas rows: SQL', method: 'GET', path: `/api/v1/atlas?${q({ rows: SQL })}` },
  { name: 'atlas rows: fractional', method: 'GET', path: `/api/v1/atlas?${q({ rows: '4.5' })}` },
  { name: 'atlas colsTo: Infinity', method: 'GET', path: `/api/v1/atlas?${q({ colsTo: 'Infinity' })}` },
  { name: 'atlas exact: maybe', method: 'GET', path: `/api/v1/atlas?${q({ exact: 'maybe' })}` },
  { name: 'atlas family: 41 characters', method: 'GET', path: `/api/v1/atlas?${q({ family: 'g'.repeat(41) })}` },
  { name: 'atlas limit: zero', method: 'GET', path: `/api/v1/atlas?${q({ limit: '0' })}` },
  { name: 'atlas offset: negative', method: 'GET', path: `/api/v1/atlas?${q({ offset: '-1' })}` },
  { name: 'atlas an unknown parameter', method: 'GET', path: `/api/v1/atlas?${q({ key: SQL })}` },
  { name: 'atlas rows twice', method: 'GET', path: '/api/v1/atlas?rows=1&rows=2' },
  { name: 'quick spec: a 10^9-vertex grid grid:31623x31623', method: 'GET', path: `/api/v1/quick?${q({ spec: 'grid:31623x31623' })}` },
  { name: 'quick spec: grid:-4x9', method: 'GET', path: `/api/v1/quick?${q({ spec: 'grid:-4x9' })}` },
  { name: 'quick spec: grid of 10^30 rows', method: 'GET', path: `/api/v1/quick?${q({ spec: `grid:1${'0'.repeat(30)}x2` })}` },
  { name: 'quick spec: 9 million vertices (over the quick limit)', method: 'GET', path: `/api/v1/quick?${q({ spec: 'grid:3000x3000' })}` },
  { name: 'quick spec: SQL', method: 'GET', path: `/api/v1/quick?${q({ spec: SQL })}` },
  { name: 'quick spec: unicode', method: 'GET', path: `/api/v1/quick?${q({ spec: UNICODE })}` },
  { name: 'quick spec: a server file', method: 'GET', path: `/api/v1/quick?${q({ spec: '/etc/passwd' })}` },
  { name: 'quick spec: mask of a server file', method: 'GET', path: `/api/v1/quick?${q({ spec: 'mask:/etc/passwd' })}` },
  { name: 'quick spec: missing', method: 'GET', path: '/api/v1/quick' },
  { name: 'quick spec: empty', method: 'GET', path: '/api/v1/quick?spec=' },
  { name: 'quick spec: 201 characters', method: 'GET', path: `/api/v1/quick?${q({ spec: `path:${'1'.repeat(196)}` })}` },
  { name: 'quick spec: twice', method: 'GET', path: '/api/v1/quick?spec=path:5&spec=path:6' },
  { name: 'quick spec: gnp with p = 2', method: 'GET', path: `/api/v1/quick?${q({ spec: 'gnp:10:2' })}` },
  { name: 'quick spec: a NUL byte', method: 'GET', path: '/api/v1/quick?spec=path%005' },
];

/**
 * Free-text filters of read-only lists, where an SQL-like or unicode string is a legal value: the answer may
 * be a 200 (an empty list) or a 4xx, but never a 5xx, and it must be JSON. (A lenient parse such as
 * atlas colsTo=0x10 read as 16 is also answered 200 here.)
 */
const freeTextCases: Case[] = [
  { name: 'runs owner: SQL', method: 'GET', path: `/api/v1/runs?${q({ owner: SQL })}` },
  { name: 'runs owner: unicode', method: 'GET', path: `/api/v1/runs?${q({ owner: UNICODE_TEXT })}` },
  { name: 'runs family: SQL', method: 'GET', path: `/api/v1/runs?${q({ family: SQL })}` },
  { name: 'runs family: LIKE wildcards', method: 'GET', path: `/api/v1/runs?${q({ family: '%_%\\' })}` },
  { name: 'runs cursor: SQL', method: 'GET', path: `/api/v1/runs?${q({ cursor: SQL })}` },
  { name: 'runs cursor: unicode', method: 'GET', path: `/api/v1/runs?${q({ cursor: UNICODE })}` },
  { name: 'runs cursor: base64 of garbage JSON', method: 'GET', path: `/api/v1/runs?${q({ cursor: Buffer.from('{"createdAt":"not a date","id":"x\'--"}').toString('base64url') })}` },
  { name: 'atlas family: SQL', method: 'GET', path: `/api/v1/atlas?${q({ family: SQL })}` },
  { name: 'atlas family: unicode', method: 'GET', path: `/api/v1/atlas?${q({ family: UNICODE_TEXT.slice(0, 20) })}` },
  { name: 'atlas colsTo: hex 0x10', method: 'GET', path: `/api/v1/atlas?${q({ colsTo: '0x10' })}` },
  { name: 'atlas entry key: SQL', method: 'GET', path: `/api/v1/atlas/${encodeURIComponent(SQL)}` },
  { name: 'atlas entry key: a 10^9-vertex grid', method: 'GET', path: `/api/v1/atlas/${encodeURIComponent('grid:31623x31623')}` },
];

/** U+0000 in text that is otherwise legal: PostgreSQL text cannot hold it, so it must be refused before the database. */
const nulCases: Case[] = [
  { name: 'runs owner: a NUL byte', method: 'GET', path: '/api/v1/runs?owner=a%00b' },
  { name: 'runs family: a NUL byte', method: 'GET', path: '/api/v1/runs?family=grid%00' },
  { name: 'runs cursor: a NUL byte', method: 'GET', path: '/api/v1/runs?cursor=a%00b' },
  { name: 'atlas family: a NUL byte', method: 'GET', path: '/api/v1/atlas?family=grid%00' },
  { name: 'atlas entry key: a NUL byte', method: 'GET', path: '/api/v1/atlas/grid%00' },
  { name: 'sweeps name: a NUL byte in an otherwise valid sweep', method: 'POST', path: '/api/v1/sweeps', init: json({ ...sweep, name: 'a\u0000b' }) },
  { name: 'graphs file name: a NUL byte, content no graph', method: 'POST', path: '/api/v1/graphs', init: () => multipart([{ name: 'file', filename: 'g\u0000.txt', content: 'p edge x\n' }]) },
];

const corpus: Array<[string, Case[]]> = [
  ['POST /api/v1/runs', runCases],
  ['POST /api/v1/sweeps', sweepCases],
  ['POST /api/v1/verify', verifyCases],
  ['POST /api/v1/graphs (multipart)', graphCases],
  ['PATCH /api/v1/runs/:id', patchCases],
  ['GET /api/v1/runs, /atlas and /quick with hostile queries', listCases],
  ['NUL bytes in otherwise legal text', nulCases],
];

beforeAll(async () => {
  const database = new Database(createDataSource(databaseUrl()), createLogger('silent'));
  key = (await loadDemoData(await database.connect())).apiKey;
  await database.close();
  server = await startBuiltServer({ CAIRN_RUN_CONCURRENCY: '0', CAIRN_RATE_LIMIT_PER_MINUTE: '1000000', CAIRN_UPLOAD_LIMIT_MB: String(UPLOAD_LIMIT_MB) });
  db = new pg.Client({ connectionString: databaseUrl() });
  await db.connect();
  // A real run to aim the PATCH bodies at; with no run workers it stays queued. Made before the baseline.
  const made = await send('POST', '/api/v1/runs', json({ spec: 'path:7' }));
  expect([200, 202]).toContain(made.status);
  runId = (JSON.parse(made.text) as { id: string }).id;
  before = await countRows();
}, 60_000);

afterAll(async () => {
  await db?.end();
  await server?.stop();
});

describe('hostile API requests get a JSON 4xx, never a 5xx', () => {
  for (const [group, cases] of corpus) {
    describe(group, () => {
      for (const c of cases) {
        (c.bug ? it.skip : it)(c.bug ? `${c.name} (${c.bug})` : c.name, async () => {
          const path = typeof c.path === 'function' ? c.path() : c.path;
          const init = typeof c.init === 'function' ? c.init() : c.init;
          const answer = await send(c.method, path, init);
          const shown = `${c.method} ${path.slice(0, 120)} -> ${answer.status} ${answer.text.slice(0, 300)}`;
          expect(answer.status, shown).toBeGreaterThanOrEqual(400);
          expect(answer.status, shown).toBeLessThan(500);
          expect(answer.contentType, shown).toMatch(/^application\/json/);
          const body = JSON.parse(answer.text) as { error?: { code?: unknown; message?: unknown } };
          expect(typeof body.error?.code, shown).toBe('string');
          expect(typeof body.error?.message, shown).toBe('string');
          expect((body.error!.code as string).length, shown).toBeGreaterThan(0);
          expect((body.error!.message as string).length, shown).toBeGreaterThan(0);
        });
      }
    });
  }
});

describe('free-text filters with SQL and unicode: 200 or a JSON 4xx, never a 5xx', () => {
  for (const c of freeTextCases) {
    it(c.name, async () => {
      const path = typeof c.path === 'function' ? c.path() : c.path;
      const answer = await send(c.method, path);
      const shown = `${c.method} ${path.slice(0, 120)} -> ${answer.status} ${answer.text.slice(0, 300)}`;
      expect(answer.status === 200 || (answer.status >= 400 && answer.status < 500), shown).toBe(true);
      expect(answer.contentType, shown).toMatch(/^application\/json/);
      const body = JSON.parse(answer.text) as { error?: { code?: unknown; message?: unknown } };
      if (answer.status !== 200) expect(typeof body.error?.code === 'string' && typeof body.error?.message === 'string', shown).toBe(true);
    });
  }
});

describe('after the corpus', () => {
  it('the server is still healthy and still answers a real request', async () => {
    expect(server.child.exitCode).toBeNull();
    const health = await send('GET', '/api/health', { auth: false });
    expect(health.status, health.text).toBe(200);
    const run = await send('GET', `/api/v1/runs/${runId}`);
    expect(run.status, run.text).toBe(200);
    const quick = await send('GET', `/api/v1/quick?${q({ spec: 'path:15' })}`);
    expect(quick.status, quick.text).toBe(200);
  });

  it('nothing was written: runs, sweeps, graphs (and the other tables) hold as many rows as before', async () => {
    expect(await countRows()).toEqual(before);
  });

  it('the server logged no failed request (no 5xx, no uncaught error)', () => {
    const failures = server
      .output()
      .split('\n')
      .filter((line) => /request failed|uncaught|unhandled/i.test(line))
      .map((line) => line.slice(0, 2000));
    expect(failures).toEqual([]);
  });
});
