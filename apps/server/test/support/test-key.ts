import { createHash, randomBytes } from 'node:crypto';
import type { ApiScope, Role } from '@cairn/schema';
import type { DataSource } from 'typeorm';

/**
 * Inserts a member and an API key straight into the database, for tests of routes other than sign-in and
 * key management. The key is stored as the design says: SHA-256 (hex) of the whole secret, its prefix
 * the first 12 characters.
 */
export async function insertMemberWithKey(
  source: DataSource,
  login: string,
  role: Role,
  scopes: ApiScope[] = ['runs:read', 'runs:write', 'atlas:read'],
): Promise<{ userId: string; secret: string; authorization: string }> {
  const githubId = 9_000_000 + randomBytes(3).readUIntBE(0, 3);
  const [user] = (await source.query(`INSERT INTO users (github_id, login, display_name, email, role) VALUES ($1, $2, $2, $3, $4) RETURNING id`, [
    githubId,
    login,
    `${login}@members.example`,
    role,
  ])) as { id: string }[];
  const secret = `cairn_${randomBytes(24).toString('base64url')}`;
  await source.query(`INSERT INTO api_keys (user_id, name, prefix, secret_hash, scopes) VALUES ($1, 'test key', $2, $3, $4)`, [
    user!.id,
    secret.slice(0, 12),
    createHash('sha256').update(secret).digest('hex'),
    scopes,
  ]);
  return { userId: user!.id, secret, authorization: `Bearer ${secret}` };
}
