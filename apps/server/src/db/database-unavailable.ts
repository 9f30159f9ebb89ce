/** Network errors of a connection that could not be made or was lost. */
const CONNECTION_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENOTFOUND', 'EPIPE']);

/**
 * Whether an error means PostgreSQL is away rather than the request being wrong: a refused or lost
 * connection, a pool that timed out connecting, or the server shutting down (SQLSTATE class 08, 57P01–57P03).
 */
export function isDatabaseUnavailable(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && typeof e === 'object' && depth < 5; e = (e as { cause?: unknown; driverError?: unknown }).driverError ?? (e as { cause?: unknown }).cause, depth++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && (CONNECTION_CODES.has(code) || code.startsWith('08') || ['57P01', '57P02', '57P03'].includes(code))) return true;
    const message = (e as { message?: unknown }).message;
    if (typeof message === 'string' && /Connection terminated|timeout exceeded when trying to connect|Connection refused/i.test(message)) return true;
  }
  return false;
}
