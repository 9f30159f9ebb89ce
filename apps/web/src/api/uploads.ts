import { ApiError, UploadResult, type UploadFormat } from '@cairn/schema';
import { useQuery } from '@tanstack/react-query';
import { ApiRequestError } from './client';
import { csrfHeaders } from './csrf';

/**
 * POST /api/v1/graphs as multipart/form-data (the file in the field `file`). Not through sendJson: the
 * browser must set the multipart content type with its boundary itself, so only the CSRF header is added.
 */
export async function uploadGraph(file: File, fields: { name?: string | undefined; format?: UploadFormat | undefined } = {}): Promise<UploadResult> {
  const form = new FormData();
  if (fields.name) form.append('name', fields.name);
  if (fields.format) form.append('format', fields.format);
  form.append('file', file, file.name);
  const res = await fetch('/api/v1/graphs', {
    method: 'POST',
    body: form,
    credentials: 'same-origin',
    headers: { accept: 'application/json', ...csrfHeaders() },
  });
  const body: unknown = await res.json().catch(() => undefined);
  if (!res.ok) {
    const parsed = ApiError.safeParse(body);
    throw new ApiRequestError(res.status, parsed.success ? parsed.data.error.message : `${res.status} ${res.statusText}`, body);
  }
  const parsed = UploadResult.safeParse(body);
  if (!parsed.success) throw new ApiRequestError(res.status, 'unexpected answer from /api/v1/graphs', body);
  return parsed.data;
}

/** Where a refused file goes wrong, when the server says (`details.line`, `details.column`). */
export function parseErrorPlace(err: unknown): { line: number; column: number } | null {
  if (!(err instanceof ApiRequestError)) return null;
  const details = (err.body as { error?: { details?: { line?: unknown; column?: unknown } } } | undefined)?.error?.details;
  const line = details?.line;
  const column = details?.column;
  return typeof line === 'number' && typeof column === 'number' ? { line, column } : null;
}

/** The server's error code (`parse_error`, `file_too_large`, ...), or null. */
export function errorCode(err: unknown): string | null {
  if (!(err instanceof ApiRequestError)) return null;
  const parsed = ApiError.safeParse(err.body);
  return parsed.success ? parsed.data.error.code : null;
}

/** The stored bytes of an upload as text (for drawing it); only for members who may read the graph. */
export function useGraphContent(graphId: string | null, enabled: boolean) {
  return useQuery({
    queryKey: ['graph-content', graphId],
    queryFn: async () => {
      const res = await fetch(`/api/v1/graphs/${encodeURIComponent(graphId!)}/content`, { credentials: 'same-origin' });
      if (!res.ok) {
        const body: unknown = await res.json().catch(() => undefined);
        const parsed = ApiError.safeParse(body);
        throw new ApiRequestError(res.status, parsed.success ? parsed.data.error.message : `${res.status} ${res.statusText}`, body);
      }
      return res.text();
    },
    enabled: enabled && graphId !== null,
    staleTime: Infinity, // stored bytes never change (the graph is keyed by its sha256)
    retry: false,
  });
}
