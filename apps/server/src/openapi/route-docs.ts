import type { z } from 'zod';
import type { Permission } from '../auth/actor';

/** What the OpenAPI document says of one route; the schemas are the same zod schemas the route parses with. */
export interface RouteDoc {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** Express form, e.g. `/api/v1/runs/:id` (written as `{id}` in the document). */
  path: string;
  tag: string;
  summary: string;
  /** What the caller needs; 'none' for open routes. */
  needs: Permission | 'none';
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  /** Content type of the body when it is not JSON (e.g. multipart/form-data). */
  bodyType?: string;
  response?: z.ZodType;
  status?: number;
  /** Content type of the answer when it is not JSON (text/csv, image/svg+xml, text/event-stream). */
  responseType?: string;
  /**
   * Error statuses the route answers beyond those the document adds by itself (400 for routes that take
   * input, 401 and 403 for routes that need a permission), e.g. [404, 409, 413].
   */
  errors?: number[];
}

const routeDocs = new Map<string, RouteDoc>();

/** Records a route for the OpenAPI document; routers call it beside each route they define. */
export function documentRoute(doc: RouteDoc): void {
  routeDocs.set(`${doc.method} ${doc.path}`, doc);
}

export function documentedRoutes(): RouteDoc[] {
  return [...routeDocs.values()].sort((a, b) => a.path.localeCompare(b.path) || a.method.localeCompare(b.method));
}
