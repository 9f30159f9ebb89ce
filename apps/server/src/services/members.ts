import type { MemberRow, Role, SignedInMember } from '@cairn/schema';
import type { DataSource, EntityManager } from 'typeorm';
import { User } from '../entities/user.entity';

/** No member has this id. */
export class UnknownMemberError extends Error {
  constructor(readonly userId: string) {
    super(`no member ${userId}`);
  }
}

/** The change would leave Cairn without an admin. */
export class LastAdminError extends Error {
  constructor() {
    super('this is the last admin; make another member admin first');
  }
}

/** What the sign-in provider says of a person. */
export interface SignInProfile {
  githubId: string;
  login: string;
  displayName: string | null;
  email: string | null;
}

// Serialises changes that count admins (first sign-in, role changes), so two at once cannot both see
// "no admin yet" or both demote "one of two" admins. The number is Cairn's own, arbitrary.
const ADMIN_COUNT_LOCK = 4780_0001;
const lockAdminCount = (tx: EntityManager) => tx.query('SELECT pg_advisory_xact_lock($1)', [ADMIN_COUNT_LOCK]);

/**
 * Creates or refreshes the member behind a sign-in (matched on the GitHub id). A new member is admin when
 * nobody has signed in before or the login is the configured admin login, a viewer otherwise; an existing
 * member keeps the role and gets the provider's current login, name and e-mail.
 */
export async function upsertSignedInMember(source: DataSource, profile: SignInProfile, adminLogin: string | undefined): Promise<User> {
  return source.transaction(async (tx) => {
    await lockAdminCount(tx);
    const repo = tx.getRepository(User);
    const existing = await repo.findOneBy({ githubId: profile.githubId });
    if (existing) {
      existing.login = profile.login;
      existing.displayName = profile.displayName;
      existing.email = profile.email;
      return repo.save(existing);
    }
    const first = (await repo.count()) === 0;
    const role: Role = first || (adminLogin !== undefined && adminLogin.toLowerCase() === profile.login.toLowerCase()) ? 'admin' : 'viewer';
    return repo.save(repo.create({ ...profile, role }));
  });
}

/** Every member, oldest first. */
export function listMembers(source: DataSource): Promise<User[]> {
  return source.getRepository(User).find({ order: { createdAt: 'ASC', id: 'ASC' } });
}

/** Changes a member's role; refuses to demote the last admin. */
export async function changeMemberRole(source: DataSource, userId: string, role: Role): Promise<User> {
  return source.transaction(async (tx) => {
    await lockAdminCount(tx);
    const repo = tx.getRepository(User);
    const user = await repo.findOneBy({ id: userId });
    if (!user) throw new UnknownMemberError(userId);
    if (user.role === role) return user;
    if (user.role === 'admin' && (await repo.countBy({ role: 'admin' })) <= 1) throw new LastAdminError();
    user.role = role;
    return repo.save(user);
  });
}

/** Turns a member's own settings on or off. */
export async function updateMemberSettings(source: DataSource, userId: string, settings: { notifyOnFinish: boolean }): Promise<User> {
  const repo = source.getRepository(User);
  const result = await repo.update({ id: userId }, { notifyOnFinish: settings.notifyOnFinish });
  if (!result.affected) throw new UnknownMemberError(userId);
  return repo.findOneByOrFail({ id: userId });
}

/** A member as they see themselves (GET /api/v1/me). */
export function signedInMemberView(user: User): SignedInMember {
  return { id: user.id, login: user.login, displayName: user.displayName, email: user.email, role: user.role, notifyOnFinish: user.notifyOnFinish };
}

/** A member as an admin's list shows them. */
export function memberRowView(user: User): MemberRow {
  return { id: user.id, login: user.login, displayName: user.displayName, email: user.email, role: user.role, createdAt: user.createdAt.toISOString() };
}
