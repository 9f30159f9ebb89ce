import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ApiError } from '@cairn/schema';
import { isDatabaseUnavailable } from '../db/database-unavailable';
import type { Logger } from '../logger';

/** An error meant for the client: its status and code reach the response as they are. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiError = { error: { code: 'not_found', message: `no API route ${req.method} ${req.baseUrl}${req.path}` } };
  res.status(404).json(body);
};

/** Turns anything thrown into the JSON error shape; never sends a stack trace. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, _req, res, next) => {
    if (res.headersSent) return next(err);
    let status = 500;
    let body: ApiError = { error: { code: 'internal', message: 'internal error' } };
    if (err instanceof HttpError) {
      status = err.status;
      body = { error: { code: err.code, message: err.message, details: err.details } };
    } else if (isDatabaseUnavailable(err)) {
      // PostgreSQL is away (the server reconnects by itself): say so, not "internal error".
      status = 503;
      body = { error: { code: 'database_unavailable', message: 'the database does not answer; try again shortly' } };
    } else if (err && typeof err === 'object' && 'type' in err && err.type === 'entity.parse.failed') {
      status = 400;
      body = { error: { code: 'bad_json', message: 'the request body is not valid JSON' } };
    } else if (err && typeof err === 'object' && 'status' in err && typeof err.status === 'number' && err.status < 500) {
      status = err.status;
      body = { error: { code: 'bad_request', message: err instanceof Error ? err.message : 'bad request' } };
    }
    if (status === 503) logger.warn({ err: (err as Error)?.message }, 'request refused: database unavailable');
    else if (status >= 500) logger.error({ err }, 'request failed');
    res.status(status).json(body);
  };
}
