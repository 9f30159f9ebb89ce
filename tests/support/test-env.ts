import { fileURLToPath } from 'node:url';

/** The repository root, found from this file rather than from the current directory. */
export const repoRoot = fileURLToPath(new URL('../../', import.meta.url));

/**
 * The tests' own database on the loopback PostgreSQL that the README test command starts. Its name must
 * end in _test: the set-up drops and re-creates it, so it can never be the demo database.
 */
export const testDb = {
  host: '127.0.0.1',
  port: Number(process.env.CAIRN_DB_PORT ?? 54780),
  user: process.env.CAIRN_DB_USER ?? 'cairn',
  name: process.env.CAIRN_TEST_DB_NAME ?? 'cairn_test',
};
if (!testDb.name.endsWith('_test')) throw new Error(`the test database name must end in _test, got ${testDb.name}`);

export const databaseUrl = (name = testDb.name) => `postgres://${testDb.user}@${testDb.host}:${testDb.port}/${name}`;

/** The environment for a server under test: the test database, quiet logs, ports chosen by the caller. */
export function serverEnv(extra: Record<string, string> = {}): Record<string, string> {
  return {
    CAIRN_DB_HOST: testDb.host,
    CAIRN_DB_PORT: String(testDb.port),
    CAIRN_DB_USER: testDb.user,
    CAIRN_DB_NAME: testDb.name,
    CAIRN_LOG_LEVEL: 'warn',
    ...extra,
  };
}

/**
 * What a server needs when the local stand-ins are off: a session secret and GitHub credentials. These
 * are placeholders; tests that use them never sign in, so nothing goes to GitHub.
 */
export const withoutStandIns: Record<string, string> = {
  CAIRN_SESSION_SECRET: 'test-session-secret-of-cairn',
  CAIRN_GITHUB_CLIENT_ID: 'unused-client-id',
  CAIRN_GITHUB_CLIENT_SECRET: 'unused-client-secret',
};
