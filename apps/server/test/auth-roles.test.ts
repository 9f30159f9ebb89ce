import type { MeResponse, MemberResponse, MembersResponse } from '@cairn/schema';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from './support/test-database';
import { insertMemberWithKey } from './support/test-key';
import { signInAs, startSignInApp, type SignedIn, type SignInApp } from './support/sign-in';

let tdb: TestDatabase;
let app: SignInApp;
let admin: SignedIn;
let wren: SignedIn;
let guest: SignedIn;

beforeAll(async () => {
  tdb = await createTestDatabase('auth_roles');
  app = await startSignInApp(tdb.db);
  admin = await signInAs(app.url, 'ines-marlow'); // first member: admin
  wren = await signInAs(app.url, 'wren-adeyemi'); // viewer until promoted
  guest = await signInAs(app.url, 'guest-reader');
});
afterAll(async () => {
  await app.close();
  await tdb.drop();
});

const setRole = (who: SignedIn, id: string, role: unknown) => who.fetch(`/api/v1/users/${id}`, { method: 'PATCH', body: JSON.stringify({ role }) });
const errorOf = async (res: Response) => ((await res.json()) as { error: { code: string; message: string } }).error;
const meOf = async (who: SignedIn) => (await (await who.fetch('/api/v1/me')).json()) as MeResponse;

describe('members and roles', () => {
  it('lists every member for an admin, oldest first', async () => {
    const res = await admin.fetch('/api/v1/users');
    expect(res.status).toBe(200);
    const { users } = (await res.json()) as MembersResponse;
    expect(users.map((u) => [u.login, u.role])).toEqual([
      ['ines-marlow', 'admin'],
      ['wren-adeyemi', 'viewer'],
      ['guest-reader', 'viewer'],
    ]);
    expect(users[0]).toEqual({ id: admin.me.user!.id, login: 'ines-marlow', displayName: 'Inès Marlow', email: 'ines@tollgate-lattice.example', role: 'admin', createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/) });
  });

  it('lets an admin change a role, which counts at once for the member’s open session', async () => {
    expect((await meOf(wren)).permissions).toEqual(['atlas:read', 'runs:read']);
    const res = await setRole(admin, wren.me.user!.id, 'researcher');
    expect(res.status).toBe(200);
    expect(((await res.json()) as MemberResponse).user).toMatchObject({ login: 'wren-adeyemi', role: 'researcher' });
    expect((await meOf(wren)).permissions).toEqual(['atlas:read', 'runs:read', 'runs:write']);
    const rows = (await (await tdb.db.connect()).query(`SELECT role FROM users WHERE id = $1`, [wren.me.user!.id])) as { role: string }[];
    expect(rows[0]!.role).toBe('researcher');
  });

  it('refuses researchers, viewers, anonymous callers and API keys', async () => {
    for (const who of [wren, guest]) {
      const res = await setRole(who, who.me.user!.id, 'admin');
      expect(res.status).toBe(403);
      expect((await errorOf(res)).code).toBe('forbidden');
      expect((await who.fetch('/api/v1/users')).status).toBe(403);
    }
    const anonymous = await fetch(`${app.url}/api/v1/users`);
    expect(anonymous.status).toBe(401);
    await anonymous.text();
    const keyed = await insertMemberWithKey(await tdb.db.connect(), 'keyed-admin', 'admin');
    const byKey = await fetch(`${app.url}/api/v1/users/${wren.me.user!.id}`, {
      method: 'PATCH',
      headers: { authorization: keyed.authorization, 'content-type': 'application/json' },
      body: JSON.stringify({ role: 'viewer' }),
    });
    expect(byKey.status).toBe(403);
    await byKey.text();
    await (await tdb.db.connect()).query(`DELETE FROM users WHERE id = $1`, [keyed.userId]);
    expect((await meOf(guest)).user!.role).toBe('viewer');
  });

  it('refuses to demote the last admin (409), and allows it once there is another', async () => {
    const alone = await setRole(admin, admin.me.user!.id, 'researcher');
    expect(alone.status).toBe(409);
    expect((await errorOf(alone)).code).toBe('last_admin');
    expect((await meOf(admin)).user!.role).toBe('admin');

    expect((await setRole(admin, guest.me.user!.id, 'admin')).status).toBe(200);
    const demoted = await setRole(admin, admin.me.user!.id, 'researcher');
    expect(demoted.status).toBe(200);
    // Now the guest is the only admin; the former admin may no longer manage anyone.
    expect((await setRole(admin, guest.me.user!.id, 'viewer')).status).toBe(403);
    const last = await setRole(guest, guest.me.user!.id, 'viewer');
    expect(last.status).toBe(409);
    expect((await setRole(guest, admin.me.user!.id, 'admin')).status).toBe(200);
  });

  it('never loses the last admin to two admins demoting each other at once', async () => {
    // Both are admins now. To make the two changes truly overlap, a transaction of the test holds both
    // members' rows until both requests are waiting inside the database, then lets go.
    const source = await tdb.db.connect();
    const holder = source.createQueryRunner();
    await holder.connect();
    await holder.startTransaction();
    await holder.query(`SELECT id FROM users WHERE id = ANY($1) FOR UPDATE`, [[admin.me.user!.id, guest.me.user!.id]]);
    const pending = Promise.all([setRole(admin, guest.me.user!.id, 'viewer'), setRole(guest, admin.me.user!.id, 'viewer')]);
    const waiting = async () =>
      ((await source.query(`SELECT count(*)::int AS n FROM pg_stat_activity WHERE datname = current_database() AND wait_event_type = 'Lock'`)) as { n: number }[])[0]!.n;
    for (let i = 0; i < 200 && (await waiting()) < 2; i++) await new Promise((r) => setTimeout(r, 10));
    expect(await waiting()).toBe(2);
    await holder.commitTransaction();
    await holder.release();
    const answers = await pending;
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409]);
    const rows = (await source.query(`SELECT count(*)::int AS n FROM users WHERE role = 'admin'`)) as { n: number }[];
    expect(rows[0]!.n).toBe(1);
    await Promise.all(answers.map((r) => r.text()));
  });

  it('answers 400 for a malformed id or role and 404 for an unknown member', async () => {
    const [current] = (await (await tdb.db.connect()).query(`SELECT login FROM users WHERE role = 'admin'`)) as { login: string }[];
    const stillAdmin = current!.login === 'ines-marlow' ? admin : guest;
    const malformed = await setRole(stillAdmin, 'ines', 'viewer');
    expect(malformed.status).toBe(400);
    expect((await errorOf(malformed)).message).toMatch(/^params\.id: /);
    const badRole = await setRole(stillAdmin, wren.me.user!.id, 'owner');
    expect(badRole.status).toBe(400);
    expect((await errorOf(badRole)).message).toMatch(/^body\.role: /);
    const unknown = await setRole(stillAdmin, '4b0c8a7e-1d2f-4c3b-9a8e-0f1e2d3c4b5a', 'viewer');
    expect(unknown.status).toBe(404);
    expect((await errorOf(unknown)).code).toBe('not_found');
  });
});
