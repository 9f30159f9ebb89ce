import { compileErrors, validate } from '@readme/openapi-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../src/index';
import { serveApp, type ServedApp } from './support/listen';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { testContext } from './support/test-context';
import { insertMemberWithKey } from './support/test-key';

// The OpenAPI document of the whole app as it is assembled (every router's documentRoute calls).
type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

let tdb: TestDatabase;
let served: ServedApp;
let base: string;
let adminKey: string;
let doc: Json;

const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;

beforeAll(async () => {
  tdb = await createTestDatabase('openapi_document');
  adminKey = (await insertMemberWithKey(await tdb.db.connect(), 'admin-openapi', 'admin')).authorization;
  served = await serveApp(createApp(testContext(tdb.db)));
  base = served.url;
  const res = await fetch(`${base}/api/v1/openapi.json`);
  expect(res.status).toBe(200);
  expect(res.headers.get('content-type')).toMatch(/^application\/json/);
  doc = (await res.json()) as Json;
});

afterAll(async () => {
  await served?.close();
  await tdb?.drop();
});

function operations(): { path: string; method: string; op: Json }[] {
  return Object.entries(doc.paths as Record<string, Json>).flatMap(([path, item]) =>
    METHODS.filter((m) => item[m]).map((method) => ({ path, method, op: item[method] as Json })),
  );
}

describe('GET /api/v1/openapi.json', () => {
  it('is a valid OpenAPI 3.1 document', async () => {
    expect(doc.openapi).toBe('3.1.0');
    const result = await validate(structuredClone(doc) as never);
    expect(result.valid, result.valid ? '' : compileErrors(result)).toBe(true);
  });

  it('documents the uploads, verification and itself with {param} paths', () => {
    for (const [path, method] of [
      ['/api/v1/graphs', 'post'],
      ['/api/v1/graphs', 'get'],
      ['/api/v1/graphs/{id}', 'get'],
      ['/api/v1/graphs/{id}', 'delete'],
      ['/api/v1/graphs/{id}/content', 'get'],
      ['/api/v1/verify', 'post'],
      ['/api/v1/openapi.json', 'get'],
    ] as const) {
      expect(doc.paths[path]?.[method], `${method} ${path}`).toBeDefined();
    }
    expect(Object.keys(doc.paths).some((p) => p.includes(':'))).toBe(false);
    const byId = doc.paths['/api/v1/graphs/{id}'].get as Json;
    expect(byId.parameters).toEqual([expect.objectContaining({ name: 'id', in: 'path', required: true, schema: expect.objectContaining({ type: 'string', format: 'uuid' }) })]);
    const uploadBody = doc.paths['/api/v1/graphs'].post.requestBody.content['multipart/form-data'].schema as Json;
    expect(uploadBody.properties.file).toMatchObject({ type: 'string', format: 'binary' });
    expect(uploadBody.properties.format.enum).toEqual(['edge-list', 'dimacs', 'matrix-market', 'json', 'mask']);
    const list = doc.paths['/api/v1/graphs'].get as Json;
    expect(list.parameters.map((p: Json) => [p.name, p.in, p.required])).toEqual([
      ['limit', 'query', false],
      ['offset', 'query', false],
    ]);
  });

  it('has the security schemes, the JSON error shape, and 400/401/403 on protected routes', () => {
    expect(doc.components.securitySchemes.apiKey).toMatchObject({ type: 'http', scheme: 'bearer' });
    expect(doc.components.securitySchemes.session).toMatchObject({ type: 'apiKey', in: 'cookie', name: 'cairn.sid' });
    const apiError = doc.components.schemas.ApiError as Json;
    expect(apiError.properties.error.required).toEqual(['code', 'message']);
    expect(Object.keys(apiError.properties.error.properties).sort()).toEqual(['code', 'details', 'message']);
    const ops = operations();
    expect(ops.length).toBeGreaterThan(5);
    for (const { path, method, op } of ops) {
      expect(op.responses.default, `${method} ${path}`).toEqual({ $ref: '#/components/responses/Error' });
      expect(op.tags).toHaveLength(1);
      if (op['x-cairn-needs'] === 'none') continue;
      expect(op.security, `${method} ${path}`).toEqual([{ apiKey: [] }, { session: [] }]);
      for (const status of ['400', '401', '403']) expect(op.responses[status], `${method} ${path} ${status}`).toHaveProperty('$ref');
    }
    const upload = doc.paths['/api/v1/graphs'].post as Json;
    expect(upload.responses['201'].content['application/json'].schema.properties.graph).toBeDefined();
    expect(upload.responses['413']).toEqual({ $ref: '#/components/responses/TooLarge' });
    expect(doc.components.responses.Error.content['application/json'].schema).toEqual({ $ref: '#/components/schemas/ApiError' });
    expect(doc.tags.map((t: Json) => t.name)).toEqual(expect.arrayContaining(['graphs', 'verify', 'meta']));
  });

  it('documents only routes that exist: no documented path gets the JSON 404 for unknown API routes', async () => {
    const filler = '00000000-0000-4000-8000-000000000000';
    for (const { path, method, op } of operations()) {
      const url = base + path.replace(/\{[^}]+\}/g, filler);
      const res = await fetch(url, {
        method: method.toUpperCase(),
        headers: { authorization: adminKey, ...(op.requestBody ? { 'content-type': 'application/json' } : {}) },
        ...(op.requestBody ? { body: '{}' } : {}),
        signal: AbortSignal.timeout(10_000),
      });
      // Streams (server-sent events) answer headers first; the status is all this needs.
      const text = res.headers.get('content-type')?.startsWith('text/event-stream') ? '' : await res.text();
      if (text === '') await res.body?.cancel();
      const unknownRoute = res.status === 404 && text.includes('"no API route');
      expect(unknownRoute, `${method.toUpperCase()} ${path} answered ${res.status} ${text.slice(0, 200)}`).toBe(false);
    }
    // The check above can fail: a path nobody defined does get that answer.
    const res = await fetch(`${base}/api/v1/graphs/${filler}/no-such-part`, { headers: { authorization: adminKey } });
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('"no API route');
  });
});
