import { ApiError } from '@cairn/schema';
import type { z } from 'zod';

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
  const res = await fetch(path, { ...init, headers: { accept: 'application/json', ...init?.headers } });
  const body: unknown = await res.json().catch(() => undefined);
  if (!res.ok && !acceptStatus.includes(res.status)) {
    const parsed = ApiError.safeParse(body);
    throw new ApiRequestError(res.status, parsed.success ? parsed.data.error.message : `${res.status} ${res.statusText}`, body);
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw new ApiRequestError(res.status, `unexpected answer from ${path}`, body);
  return parsed.data;
}
