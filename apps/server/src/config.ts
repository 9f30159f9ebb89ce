import { z } from 'zod';
import { MAX_RUN_EDGES, MAX_RUN_VERTICES } from './services/run-limits';

// Port 0 lets the system choose a free port (the tests use it).
const port = (fallback: number) => z.coerce.number().int().min(0).max(65535).default(fallback);
const count = (fallback: number, max = 1_000_000_000) => z.coerce.number().int().min(1).max(max).default(fallback);
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
  CAIRN_PUBLIC_URL: z.string().url().optional(),
  CAIRN_SESSION_SECRET: z.string().min(16, 'at least 16 characters').optional(),
  CAIRN_GITHUB_CLIENT_ID: z.string().min(1).optional(),
  CAIRN_GITHUB_CLIENT_SECRET: z.string().min(1).optional(),
  CAIRN_ADMIN_LOGIN: z.string().min(1).optional(),
  CAIRN_SMTP_HOST: z.string().min(1).optional(),
  CAIRN_MAIL_FROM: z.string().min(3).default('Cairn <cairn@cairn.invalid>'),
  CAIRN_MAIL_AFTER_SECONDS: z.coerce.number().min(0).default(30),
  CAIRN_RUN_CONCURRENCY: z.coerce.number().int().min(0).max(64).default(1),
  CAIRN_ENGINE_THREADS: z.coerce.number().int().min(1).max(64).optional(),
  CAIRN_ENGINE_MEMORY_MB: z.coerce.number().int().min(32).max(1_048_576).optional(),
  CAIRN_UPLOAD_LIMIT_MB: z.coerce.number().min(0.001).max(1024).default(20),
  CAIRN_RATE_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(600),
  // Per member, by role (viewers start no runs): runs queued or running at once (outside sweeps), sweeps
  // with a run queued or running, and the largest graph of a run (never above the server's hard cap).
  CAIRN_MAX_ACTIVE_RUNS_RESEARCHER: count(20),
  CAIRN_MAX_ACTIVE_RUNS_ADMIN: count(100),
  CAIRN_MAX_ACTIVE_SWEEPS_RESEARCHER: count(5),
  CAIRN_MAX_ACTIVE_SWEEPS_ADMIN: count(20),
  CAIRN_MAX_RUN_VERTICES_RESEARCHER: count(250_000, MAX_RUN_VERTICES),
  CAIRN_MAX_RUN_EDGES_RESEARCHER: count(1_000_000, MAX_RUN_EDGES),
  CAIRN_MAX_RUN_VERTICES_ADMIN: count(MAX_RUN_VERTICES, MAX_RUN_VERTICES),
  CAIRN_MAX_RUN_EDGES_ADMIN: count(MAX_RUN_EDGES, MAX_RUN_EDGES),
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
  /** Where people reach the server (links in mail, the OAuth callback). */
  publicUrl: string;
  /** Signs session cookies; a fixed local value only when the local stand-ins run. */
  sessionSecret: string;
  /** Real GitHub when both are set; otherwise the local fake provider (which needs devServices). */
  github: { clientId: string; clientSecret: string } | undefined;
  /** The login made admin on first sign-in; without it the first member to sign in is admin. */
  adminLogin: string | undefined;
  smtp: { host: string; port: number };
  mailFrom: string;
  /** Runs that take longer than this send their owner a "run finished" mail (when opted in). */
  mailAfterSeconds: number;
  /** Runs this process works on at once; 0 serves the API only (another process runs the queue). */
  runConcurrency: number;
  engineThreads: number | undefined;
  /** Heap limit of each engine worker thread, in MiB; a run beyond it fails with out_of_memory. */
  engineMemoryMb: number | undefined;
  uploadLimitBytes: number;
  rateLimitPerMinute: number;
  /** What a member of each role that may start runs may have queued and how large its graphs may be. */
  memberLimits: Record<RunningRole, MemberLimits>;
}

/** The roles that may start runs (viewers may not). */
export type RunningRole = 'researcher' | 'admin';

export interface MemberLimits {
  /** Runs outside sweeps queued or running at once. */
  activeRuns: number;
  /** Sweeps with at least one run queued or running (each has at most MAX_SWEEP_CELLS cells). */
  activeSweeps: number;
  /** The largest graph of a run, a sweep's cell or an upload run. */
  runVertices: number;
  runEdges: number;
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
  if ((e.CAIRN_GITHUB_CLIENT_ID === undefined) !== (e.CAIRN_GITHUB_CLIENT_SECRET === undefined)) {
    throw new ConfigError('invalid configuration in the environment:\n  CAIRN_GITHUB_CLIENT_ID and CAIRN_GITHUB_CLIENT_SECRET go together: set both or neither');
  }
  if (!e.CAIRN_SESSION_SECRET && !e.CAIRN_DEV_SERVICES) {
    throw new ConfigError('invalid configuration in the environment:\n  CAIRN_SESSION_SECRET: required when CAIRN_DEV_SERVICES is off');
  }
  if (!e.CAIRN_GITHUB_CLIENT_ID && !e.CAIRN_DEV_SERVICES) {
    throw new ConfigError(
      'invalid configuration in the environment:\n  CAIRN_GITHUB_CLIENT_ID: required when CAIRN_DEV_SERVICES is off (sign-in needs GitHub or the local provider)',
    );
  }
  return {
    host: e.CAIRN_HOST,
    port: e.CAIRN_PORT,
    databaseUrl,
    webDist: e.CAIRN_WEB_DIST,
    devServices: e.CAIRN_DEV_SERVICES,
    devPort: e.CAIRN_DEV_PORT,
    smtpPort: e.CAIRN_SMTP_PORT,
    logLevel: e.CAIRN_LOG_LEVEL,
    publicUrl: (e.CAIRN_PUBLIC_URL ?? `http://${e.CAIRN_HOST}:${e.CAIRN_PORT}`).replace(/\/+$/, ''),
    sessionSecret: e.CAIRN_SESSION_SECRET ?? 'cairn-local-session-secret-not-for-production',
    github: e.CAIRN_GITHUB_CLIENT_ID && e.CAIRN_GITHUB_CLIENT_SECRET ? { clientId: e.CAIRN_GITHUB_CLIENT_ID, clientSecret: e.CAIRN_GITHUB_CLIENT_SECRET } : undefined,
    adminLogin: e.CAIRN_ADMIN_LOGIN,
    smtp: { host: e.CAIRN_SMTP_HOST ?? e.CAIRN_HOST, port: e.CAIRN_SMTP_PORT },
    mailFrom: e.CAIRN_MAIL_FROM,
    mailAfterSeconds: e.CAIRN_MAIL_AFTER_SECONDS,
    runConcurrency: e.CAIRN_RUN_CONCURRENCY,
    engineThreads: e.CAIRN_ENGINE_THREADS,
    engineMemoryMb: e.CAIRN_ENGINE_MEMORY_MB,
    uploadLimitBytes: Math.round(e.CAIRN_UPLOAD_LIMIT_MB * 1024 * 1024),
    rateLimitPerMinute: e.CAIRN_RATE_LIMIT_PER_MINUTE,
    memberLimits: {
      researcher: {
        activeRuns: e.CAIRN_MAX_ACTIVE_RUNS_RESEARCHER,
        activeSweeps: e.CAIRN_MAX_ACTIVE_SWEEPS_RESEARCHER,
        runVertices: e.CAIRN_MAX_RUN_VERTICES_RESEARCHER,
        runEdges: e.CAIRN_MAX_RUN_EDGES_RESEARCHER,
      },
      admin: {
        activeRuns: e.CAIRN_MAX_ACTIVE_RUNS_ADMIN,
        activeSweeps: e.CAIRN_MAX_ACTIVE_SWEEPS_ADMIN,
        runVertices: e.CAIRN_MAX_RUN_VERTICES_ADMIN,
        runEdges: e.CAIRN_MAX_RUN_EDGES_ADMIN,
      },
    },
  };
}
