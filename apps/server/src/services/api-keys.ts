import { createHash, randomBytes } from 'node:crypto';
import type { ApiKeyInfo, ApiScope } from '@cairn/schema';
import { IsNull, type DataSource } from 'typeorm';
import { ApiKey } from '../entities/api-key.entity';
import { User } from '../entities/user.entity';
import { UnknownMemberError } from './members';
import { preparedRows } from '../db/prepared-rows';

/** Every secret starts so; a reader (or a secret scanner) recognises a Cairn key by it. */
export const KEY_SECRET_PREFIX = 'cairn_';
/** How much of the secret is kept in the clear to recognise a key in a list. */
export const KEY_PREFIX_LENGTH = 12;

/** SHA-256 (hex) of the whole secret: the only form in which a key is stored. */
export function hashKeySecret(secret: string): string {
  return createHash('sha256').update(secret).digest('hex');
}

/** `cairn_` and 43 base64url characters (256 random bits). */
function newSecret(): string {
  return KEY_SECRET_PREFIX + randomBytes(32).toString('base64url');
}

/** A key as the API shows it: never the secret or its hash. */
export function apiKeyView(key: ApiKey, owner: Pick<User, 'id' | 'login'>): ApiKeyInfo {
  return {
    id: key.id,
    name: key.name,
    prefix: key.prefix,
    scopes: key.scopes,
    owner: { id: owner.id, login: owner.login },
    createdAt: key.createdAt.toISOString(),
    lastUsedAt: key.lastUsedAt ? key.lastUsedAt.toISOString() : null,
    revokedAt: key.revokedAt ? key.revokedAt.toISOString() : null,
  };
}

export interface NewApiKey {
  userId: string;
  name: string;
  scopes: ApiScope[];
  /** The admin who made it; null (or absent) for keys made by the demo loader or other tooling. */
  createdBy?: string | null;
}

const isUniqueViolation = (err: unknown, constraintPart: string) =>
  typeof err === 'object' && err !== null && (err as { code?: string }).code === '23505' && String((err as { constraint?: string }).constraint ?? '').includes(constraintPart);

/**
 * Makes a key for a member and returns it with its secret, which exists nowhere else afterwards.
 * Throws UnknownMemberError when the member does not exist.
 */
export async function createApiKey(source: DataSource, input: NewApiKey): Promise<{ key: ApiKeyInfo; secret: string }> {
  // Two secrets share their first 12 characters about once in 7·10^10 pairs; the prefix is unique, so try again.
  for (let attempt = 0; ; attempt++) {
    const secret = newSecret();
    try {
      return await source.transaction(async (tx) => {
        const owner = await tx.getRepository(User).findOne({ where: { id: input.userId }, lock: { mode: 'pessimistic_read' } });
        if (!owner) throw new UnknownMemberError(input.userId);
        const repo = tx.getRepository(ApiKey);
        const saved = await repo.save(
          repo.create({
            userId: owner.id,
            name: input.name,
            scopes: [...input.scopes],
            prefix: secret.slice(0, KEY_PREFIX_LENGTH),
            secretHash: hashKeySecret(secret),
            createdBy: input.createdBy ?? null,
            lastUsedAt: null,
            revokedAt: null,
          }),
        );
        return { key: apiKeyView(saved, owner), secret };
      });
    } catch (err) {
      if (attempt < 3 && isUniqueViolation(err, 'prefix')) continue;
      throw err;
    }
  }
}

/** Every key (optionally one member's), newest first, with its owner. */
export async function listApiKeys(source: DataSource, filter: { userId?: string | undefined } = {}): Promise<ApiKeyInfo[]> {
  const keys = await source.getRepository(ApiKey).find({
    where: filter.userId ? { userId: filter.userId } : {},
    order: { createdAt: 'DESC', id: 'ASC' },
  });
  if (keys.length === 0) return [];
  const ownerIds = [...new Set(keys.map((k) => k.userId))];
  const owners = await source.getRepository(User).createQueryBuilder('u').where('u.id IN (:...ids)', { ids: ownerIds }).getMany();
  const byId = new Map(owners.map((u) => [u.id, u]));
  return keys.flatMap((k) => {
    const owner = byId.get(k.userId);
    return owner ? [apiKeyView(k, owner)] : [];
  });
}

/**
 * Revokes a key (from the next request on). Revoking a revoked key changes nothing and is no error;
 * false when no key has that id.
 */
export async function revokeApiKey(source: DataSource, id: string): Promise<boolean> {
  const repo = source.getRepository(ApiKey);
  await repo.update({ id, revokedAt: IsNull() }, { revokedAt: () => 'now()' });
  return repo.existsBy({ id });
}

/** The row of USE_KEY: the key's columns and its owner's (prefixed `u_`). */
interface UsedKeyRow {
  id: string;
  user_id: string;
  name: string;
  prefix: string;
  secret_hash: string;
  scopes: ApiScope[];
  created_by: string | null;
  created_at: Date;
  last_used_at: Date;
  revoked_at: Date | null;
  u_github_id: string;
  u_login: string;
  u_display_name: string | null;
  u_email: string | null;
  u_role: User['role'];
  u_notify_on_finish: boolean;
  u_created_at: Date;
  u_updated_at: Date;
}

/**
 * How fine a key's "last used" is, in seconds: a use writes it only when the stored one is older than
 * this. Writing it on every request made every request of a busy key wait for the one before it on
 * that row's lock and a WAL flush (the load test's run-detail p99 with one key at 50 connections); a
 * minute is fine enough to tell a key in use from an idle one.
 */
export const KEY_USE_PRECISION_SECONDS = 60;

/**
 * Reads the live key with this hash and its owner, and marks it used when its last use is older than
 * KEY_USE_PRECISION_SECONDS, in one statement (one round trip, one index lookup on the unique
 * secret_hash): a revoked key matches no row, so it is refused from the first request after its
 * revocation committed.
 */
const USE_KEY = `WITH live AS (
    SELECT id, user_id, name, prefix, secret_hash, scopes, created_by, created_at, last_used_at, revoked_at
    FROM api_keys WHERE secret_hash = $1 AND revoked_at IS NULL
  ), used AS (
    UPDATE api_keys k SET last_used_at = now() FROM live
    WHERE k.id = live.id AND (live.last_used_at IS NULL OR live.last_used_at < now() - make_interval(secs => $2))
    RETURNING k.id, k.last_used_at
  )
  SELECT live.id, live.user_id, live.name, live.prefix, live.secret_hash, live.scopes, live.created_by, live.created_at,
    COALESCE(used.last_used_at, live.last_used_at) AS last_used_at, live.revoked_at,
    u.github_id AS u_github_id, u.login AS u_login, u.display_name AS u_display_name, u.email AS u_email,
    u.role AS u_role, u.notify_on_finish AS u_notify_on_finish, u.created_at AS u_created_at, u.updated_at AS u_updated_at
  FROM live JOIN users u ON u.id = live.user_id LEFT JOIN used ON used.id = live.id`;

/**
 * The live key with this secret and its owner, its use recorded to the minute; undefined for an unknown
 * or revoked secret. Looked up on every request (no cache), so a revocation takes effect at once.
 */
export async function useApiKey(source: DataSource, secret: string): Promise<{ key: ApiKey; user: User } | undefined> {
  const [row] = await preparedRows<UsedKeyRow>(source, USE_KEY, [hashKeySecret(secret), KEY_USE_PRECISION_SECONDS]);
  if (!row) return undefined;
  const key = Object.assign(new ApiKey(), {
    id: row.id,
    userId: row.user_id,
    name: row.name,
    prefix: row.prefix,
    secretHash: row.secret_hash,
    scopes: row.scopes,
    createdBy: row.created_by,
    createdAt: row.created_at,
    lastUsedAt: row.last_used_at,
    revokedAt: row.revoked_at,
  });
  const user = Object.assign(new User(), {
    id: row.user_id,
    githubId: row.u_github_id,
    login: row.u_login,
    displayName: row.u_display_name,
    email: row.u_email,
    role: row.u_role,
    notifyOnFinish: row.u_notify_on_finish,
    createdAt: row.u_created_at,
    updatedAt: row.u_updated_at,
  });
  return { key, user };
}
