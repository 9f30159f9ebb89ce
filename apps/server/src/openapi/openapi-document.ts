import { ApiError } from '@cairn/schema';
import type { z } from 'zod';
import { openApiSchema } from './json-schema';
import type { RouteDoc } from './route-docs';

type Json = Record<string, unknown>;

/** The session cookie the sign-in sets (express-session's name for it in auth/). */
const SESSION_COOKIE = 'cairn.sid';

/** What each error status means, as the document's shared responses say it. */
const ERROR_RESPONSES: Readonly<Record<number, { name: string; description: string }>> = {
  400: { name: 'BadRequest', description: 'The request is invalid; `details.problems` names each field that is wrong (`body.spec`, `query.limit`, ...)' },
  401: { name: 'Unauthenticated', description: 'Nobody is signed in and no API key was sent (Authorization: Bearer cairn_...)' },
  403: { name: 'Forbidden', description: "The member's role or the API key's scopes do not allow this" },
  404: { name: 'NotFound', description: 'No such thing, or one the caller may not see' },
  409: { name: 'Conflict', description: 'The request conflicts with what is stored' },
  413: { name: 'TooLarge', description: 'The upload, body or graph is larger than the server accepts' },
  429: { name: 'RateLimited', description: 'Too many requests (`details.retryAfterSeconds` says when to try again), or, on submissions, too many of your runs or sweeps queued or running at once (`details.limit`, `details.active`)' },
};

export interface DocumentInfo {
  version: string;
}

/**
 * The OpenAPI 3.1 document of every documented route: paths in `{id}` form, the zod schemas of params,
 * query, body and answer as JSON Schema, the bearer API key and the session cookie as security schemes,
 * and the one JSON error shape `{ error: { code, message, details } }` behind every error response.
 */
export function openApiDocument(routes: readonly RouteDoc[], info: DocumentInfo): Json {
  const schemas: Json = {};
  const addComponent = (name: string, schema: Json) => {
    schemas[name] = schema;
  };
  schemas.ApiError = openApiSchema(ApiError, 'output', 'ApiError', addComponent);
  const responses: Json = { Error: errorResponse('An error, in the JSON error shape') };
  for (const { name, description } of Object.values(ERROR_RESPONSES)) responses[name] = errorResponse(description);

  const paths: Record<string, Json> = {};
  const operationIds = new Set<string>();
  for (const route of routes) {
    const path = openApiPath(route.path);
    const operationId = uniqueId(operationIdOf(route), operationIds);
    (paths[path] ??= {})[route.method] = operation(route, path, operationId, addComponent);
  }

  return {
    openapi: '3.1.0',
    info: {
      title: 'Cairn API',
      version: info.version,
      description:
        'Vertex rankings, rank numbers and tree-depth of grids and of uploaded graphs: runs, sweeps, the atlas, uploads and verification. Scripts authenticate with an API key (Authorization: Bearer cairn_...); the web app with its session cookie.',
    },
    tags: [...new Set(routes.map((r) => r.tag))].sort().map((name) => ({ name })),
    paths,
    components: {
      schemas,
      responses,
      securitySchemes: {
        apiKey: { type: 'http', scheme: 'bearer', bearerFormat: 'cairn_...', description: 'An API key, made by an admin; its scopes narrow what its owner may do' },
        session: { type: 'apiKey', in: 'cookie', name: SESSION_COOKIE, description: 'The session of a member signed in through GitHub (writes also need the X-CSRF-Token header)' },
      },
    },
  };
}

function operation(route: RouteDoc, path: string, operationId: string, addComponent: (name: string, schema: Json) => void): Json {
  const schemaOf = (schema: z.ZodType, io: 'input' | 'output', part: string) => openApiSchema(schema, io, `${operationId}_${part}`, addComponent);
  const parameters = [...pathParameters(route, path, schemaOf), ...objectParameters(route.query, 'query', schemaOf)];
  const takesInput = parameters.length > 0 || route.body !== undefined;
  const protectedRoute = route.needs !== 'none';
  const op: Json = {
    operationId,
    tags: [route.tag],
    summary: route.summary,
    description: protectedRoute ? `Needs \`${route.needs}\`.` : 'Open to everyone; no sign-in needed.',
    'x-cairn-needs': route.needs,
  };
  if (protectedRoute) op.security = [{ apiKey: [] }, { session: [] }];
  if (parameters.length > 0) op.parameters = parameters;
  if (route.body) {
    op.requestBody = { required: true, content: { [route.bodyType ?? 'application/json']: { schema: schemaOf(route.body, 'input', 'body') } } };
  }
  const status = route.status ?? 200;
  const responses: Json = { [String(status)]: successResponse(route, status, schemaOf) };
  const errorStatuses = new Set(route.errors ?? []);
  if (takesInput || protectedRoute) errorStatuses.add(400);
  if (protectedRoute) {
    errorStatuses.add(401);
    errorStatuses.add(403);
  }
  if (route.path.startsWith('/api/')) errorStatuses.add(429);
  for (const code of [...errorStatuses].sort((a, b) => a - b)) {
    const shared = ERROR_RESPONSES[code];
    responses[String(code)] = shared ? { $ref: `#/components/responses/${shared.name}` } : errorResponse(`Error ${code}`);
  }
  responses.default = { $ref: '#/components/responses/Error' };
  op.responses = responses;
  return op;
}

function successResponse(route: RouteDoc, status: number, schemaOf: (s: z.ZodType, io: 'input' | 'output', part: string) => Json): Json {
  if (status === 204) return { description: 'Done; no content' };
  const type = route.responseType ?? 'application/json';
  const schema = route.response ? schemaOf(route.response, 'output', 'response') : type === 'application/json' ? {} : { type: 'string' };
  return { description: route.summary, content: { [type]: { schema } } };
}

function errorResponse(description: string): Json {
  return { description, content: { 'application/json': { schema: { $ref: '#/components/schemas/ApiError' } } } };
}

/** Path parameters: those of the params schema, and any the path names that the schema does not (as strings). */
function pathParameters(route: RouteDoc, path: string, schemaOf: (s: z.ZodType, io: 'input' | 'output', part: string) => Json): Json[] {
  const declared = objectParameters(route.params, 'path', schemaOf);
  const named = [...path.matchAll(/\{([^}]+)\}/g)].map((m) => m[1]!);
  const byName = new Map(declared.map((p) => [p.name as string, p]));
  return named.map((name) => byName.get(name) ?? { name, in: 'path', required: true, schema: { type: 'string' } });
}

/** One parameter per property of an object schema (params or query). */
function objectParameters(schema: z.ZodType | undefined, where: 'path' | 'query', schemaOf: (s: z.ZodType, io: 'input' | 'output', part: string) => Json): Json[] {
  if (!schema) return [];
  const json = schemaOf(schema, 'input', where);
  const properties = (json.properties ?? {}) as Record<string, Json>;
  const required = new Set((json.required ?? []) as string[]);
  return Object.entries(properties).map(([name, property]) => {
    const { description, ...rest } = property;
    return {
      name,
      in: where,
      required: where === 'path' || required.has(name),
      ...(typeof description === 'string' ? { description } : {}),
      schema: rest,
    };
  });
}

/** Express's `/runs/:id` is OpenAPI's `/runs/{id}`. */
export function openApiPath(expressPath: string): string {
  return expressPath.replace(/:([A-Za-z0-9_]+)/g, '{$1}');
}

/** `get /api/v1/graphs/:id/content` becomes `getGraphsByIdContent`. */
function operationIdOf(route: RouteDoc): string {
  const words = route.path
    .replace(/^\/api(\/v\d+)?/, '')
    .split('/')
    .filter(Boolean)
    .map((segment) => (segment.startsWith(':') ? `by-${segment.slice(1)}` : segment))
    .flatMap((segment) => segment.split(/[^A-Za-z0-9]+/))
    .filter(Boolean);
  return [route.method, ...words].map((w, i) => (i === 0 ? w : w[0]!.toUpperCase() + w.slice(1))).join('');
}

function uniqueId(id: string, taken: Set<string>): string {
  let candidate = id;
  for (let n = 2; taken.has(candidate); n++) candidate = `${id}${n}`;
  taken.add(candidate);
  return candidate;
}
