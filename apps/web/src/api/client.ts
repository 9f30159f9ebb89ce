import { ApiError } from '@cairn/schema';
import type { z } from 'zod';
import { csrfHeaders } from './csrf';

/** A failed API call: the HTTP status and, when the server sent one, its JSON error. */
export class ApiRequestError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly body: unknown,
  ) {
    super(message);
  }
}

/**
 * Fetches JSON from the Cairn API and checks it against a schema. Some routes answer a non-2xx status
 * with a body that is still meaningful (health answers 503 with the reason); `acceptStatus` keeps those.
 */
export async function fetchJson<T extends z.ZodType>(
  path: string,
  schema: T,
  { acceptStatus = [], init }: { acceptStatus?: number[]; init?: RequestInit } = {},
): Promise<z.infer<T>> {
  const write = init?.method !== undefined && !['GET', 'HEAD'].includes(init.method.toUpperCase());
  const res = await fetch(path, {
    credentials: 'same-origin',
    ...init,
    headers: { accept: 'application/json', ...(write ? csrfHeaders() : {}), ...init?.headers },
  });
  const body: unknown = await res.json().catch(() => undefined);
  if (!res.ok && !acceptStatus.includes(res.status)) {
    const parsed = ApiError.safeParse(body);
    throw new ApiRequestError(res.status, parsed.success ? parsed.data.error.message : `${res.status} ${res.statusText}`, body);
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw new ApiRequestError(res.status, `unexpected answer from ${path}`, body);
  return parsed.data;
}

/** Sends a JSON body (POST, PATCH, PUT, DELETE) with the session's CSRF token, and checks the answer. */
export function sendJson<T extends z.ZodType>(method: 'POST' | 'PATCH' | 'PUT' | 'DELETE', path: string, body: unknown, schema: T): Promise<z.infer<T>> {
  return fetchJson(path, schema, {
    init: { method, body: body === undefined ? undefined : JSON.stringify(body), headers: body === undefined ? {} : { 'content-type': 'application/json' } },
  });
}

/** The field-by-field problems of a 400 answer (`details.problems`), for forms to show beside each field. */
export function fieldProblems(err: unknown): { field: string; message: string }[] {
  if (!(err instanceof ApiRequestError)) return [];
  const details = (err.body as { error?: { details?: { problems?: unknown } } } | undefined)?.error?.details;
  const problems = details?.problems;
  return Array.isArray(problems) ? problems.filter((p): p is { field: string; message: string } => typeof p?.field === 'string' && typeof p?.message === 'string') : [];
}
