import { pino, type Logger } from 'pino';

export type { Logger };

/** One structured logger for the server; secrets are redacted wherever they appear in a log record. */
export function createLogger(level: string): Logger {
  return pino({
    level,
    base: { service: 'cairn' },
    redact: { paths: ['req.headers.authorization', 'req.headers.cookie', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]'], censor: '[redacted]' },
  });
}
