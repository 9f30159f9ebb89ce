import { z } from 'zod';

// Port 0 lets the system choose a free port (the tests use it).
const port = (fallback: number) => z.coerce.number().int().min(0).max(65535).default(fallback);
const flag = (fallback: boolean) =>
  z
    .enum(['1', '0', 'true', 'false', 'yes', 'no'])
    .default(fallback ? '1' : '0')
    .transform((v) => v === '1' || v === 'true' || v === 'yes');

/** Every setting the server reads from the environment, checked once at start-up. */
const ConfigSchema = z.object({
  CAIRN_HOST: z.string().min(1).default('127.0.0.1'),
  CAIRN_PORT: port(4780),
  CAIRN_DATABASE_URL: z.string().url().optional(),
  CAIRN_DB_HOST: z.string().min(1).default('127.0.0.1'),
  CAIRN_DB_PORT: port(54780),
  CAIRN_DB_NAME: z.string().regex(/^[a-z_][a-z0-9_]*$/, 'a lower-case SQL name').default('cairn'),
  CAIRN_DB_USER: z.string().min(1).default('cairn'),
  CAIRN_WEB_DIST: z.string().optional(),
  CAIRN_DEV_SERVICES: flag(true),
  CAIRN_DEV_PORT: port(4781),
  CAIRN_SMTP_PORT: port(4782),
  CAIRN_LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
});

export interface Config {
  host: string;
  port: number;
  databaseUrl: string;
  webDist: string | undefined;
  devServices: boolean;
  devPort: number;
  smtpPort: number;
  logLevel: z.infer<typeof ConfigSchema>['CAIRN_LOG_LEVEL'];
}

export class ConfigError extends Error {}

/** Reads the configuration from an environment, naming every variable that is wrong and why. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = ConfigSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new ConfigError(`invalid configuration in the environment:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const databaseUrl =
    e.CAIRN_DATABASE_URL ?? `postgres://${encodeURIComponent(e.CAIRN_DB_USER)}@${e.CAIRN_DB_HOST}:${e.CAIRN_DB_PORT}/${e.CAIRN_DB_NAME}`;
  return {
    host: e.CAIRN_HOST,
    port: e.CAIRN_PORT,
    databaseUrl,
    webDist: e.CAIRN_WEB_DIST,
    devServices: e.CAIRN_DEV_SERVICES,
    devPort: e.CAIRN_DEV_PORT,
    smtpPort: e.CAIRN_SMTP_PORT,
    logLevel: e.CAIRN_LOG_LEVEL,
  };
}
