import type { ApiScope, Role } from '@cairn/schema';
import type { ApiKey } from '../entities/api-key.entity';
import type { User } from '../entities/user.entity';

/** Who is making a request: nobody, a signed-in member (session cookie), or a script with an API key. */
export type Actor =
  | { kind: 'anonymous' }
  | { kind: 'session'; user: User }
  | { kind: 'key'; user: User; key: ApiKey };

/**
 * Everything a route may ask for. `runs:read` reads runs one may see (public, shared by link, one's own;
 * every run for an admin); `runs:write` creates runs, sweeps and uploads and changes one's own;
 * `admin` manages members' roles and API keys.
 */
export type Permission = ApiScope | 'admin';

const ROLE_PERMISSIONS: Readonly<Record<Role, readonly Permission[]>> = {
  viewer: ['atlas:read', 'runs:read'],
  researcher: ['atlas:read', 'runs:read', 'runs:write'],
  admin: ['atlas:read', 'runs:read', 'runs:write', 'admin'],
};

/** Anonymous visitors read the atlas only (and runs shared with them by link, which need no sign-in). */
const ANONYMOUS_PERMISSIONS: readonly Permission[] = ['atlas:read'];

/**
 * What an actor may do: a member's role decides; an API key narrows that to its scopes and never grants
 * `admin` (managing people and keys needs a signed-in admin).
 */
export function permissionsOf(actor: Actor): ReadonlySet<Permission> {
  if (actor.kind === 'anonymous') return new Set(ANONYMOUS_PERMISSIONS);
  const byRole = ROLE_PERMISSIONS[actor.user.role];
  if (actor.kind === 'session') return new Set(byRole);
  return new Set(byRole.filter((p): p is ApiScope => p !== 'admin' && actor.key.scopes.includes(p)));
}

export function actorCan(actor: Actor, permission: Permission): boolean {
  return permissionsOf(actor).has(permission);
}

/** The member behind an actor, if any. */
export function actorUser(actor: Actor): User | undefined {
  return actor.kind === 'anonymous' ? undefined : actor.user;
}

/** Admins see every run; others see their own. */
export function seesEveryRun(actor: Actor): boolean {
  return actor.kind !== 'anonymous' && actor.user.role === 'admin';
}
