import type { MeResponse } from '@cairn/schema';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AdminPage } from '../src/pages/AdminPage';
import { bodyOf, json, ME_ADMIN, on, renderRoutes, stubFetch, uuid as id, type Route, type SentRequest } from './support/render-page';

const member = (n: number, login: string, role: string) => ({ id: id(n), login, displayName: null, email: `${login}@seminar.example`, role, createdAt: '2026-01-02T09:00:00.000Z' });

type Reply = { status: number; body?: unknown };

/** Answers /api/v1/me with `me` and each `METHOD /path` of `routes` with its reply, or with the reply made from the body sent. */
function stubApi(routes: Record<string, Reply | ((body: unknown) => Reply)>, me: MeResponse = ME_ADMIN): SentRequest[] {
  const answers: Route[] = Object.entries(routes).map(([route, r]) => {
    const [method, path] = route.split(' ') as [string, string];
    return on(method, path, (_url, init) => {
      const reply = typeof r === 'function' ? r(bodyOf(init)) : r;
      return json(reply.status, reply.body);
    });
  });
  return stubFetch(on('GET', '/api/v1/me', () => json(200, me)), ...answers);
}

const renderAdmin = (path: string) => renderRoutes([{ path: '/admin/*', element: <AdminPage /> }], path).router;

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('Admin · members', () => {
  it('opens on members, changes a role with PATCH and shows the new one', async () => {
    let users = [member(1, 'root-admin', 'admin'), member(2, 'grace', 'viewer')];
    const calls = stubApi({
      'GET /api/v1/users': () => ({ status: 200, body: { users } }),
      [`PATCH /api/v1/users/${id(2)}`]: (body) => {
        users = users.map((u) => (u.id === id(2) ? { ...u, role: (body as { role: string }).role } : u));
        return { status: 200, body: { user: users[1] } };
      },
    });
    const router = renderAdmin('/admin');
    const table = await screen.findByTestId('members-table');
    expect(router.state.location.pathname).toBe('/admin/members');
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    fireEvent.change(screen.getByLabelText('Role of grace'), { target: { value: 'researcher' } });
    await waitFor(() => expect((screen.getByLabelText('Role of grace') as HTMLSelectElement).value).toBe('researcher'));
    const patch = calls.find((c) => c.method === 'PATCH')!;
    expect({ method: patch.method, url: patch.url, body: patch.body }).toEqual({ method: 'PATCH', url: `/api/v1/users/${id(2)}`, body: { role: 'researcher' } });
  });

  it("shows the server's 409 when the last admin would be demoted, and keeps the role", async () => {
    stubApi({
      'GET /api/v1/users': { status: 200, body: { users: [member(1, 'root-admin', 'admin')] } },
      [`PATCH /api/v1/users/${id(1)}`]: { status: 409, body: { error: { code: 'last_admin', message: 'root-admin is the last admin; make another admin first' } } },
    });
    renderAdmin('/admin/members');
    await screen.findByTestId('members-table');
    fireEvent.change(screen.getByLabelText('Role of root-admin'), { target: { value: 'viewer' } });
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toBe('root-admin’s role stays as it was: root-admin is the last admin; make another admin first');
    expect((screen.getByLabelText('Role of root-admin') as HTMLSelectElement).value).toBe('admin');
  });

  it('finds members by login, name or e-mail', async () => {
    stubApi({ 'GET /api/v1/users': { status: 200, body: { users: [member(1, 'root-admin', 'admin'), member(2, 'grace', 'viewer'), member(3, 'emmy', 'researcher')] } } });
    renderAdmin('/admin/members');
    const table = await screen.findByTestId('members-table');
    fireEvent.change(screen.getByLabelText('Find a member'), { target: { value: 'emmy@' } });
    await waitFor(() => expect(within(table).getAllByRole('row')).toHaveLength(2));
    expect(table.textContent).toContain('emmy');
  });
});

describe('Admin · access and mail', () => {
  it('tells a researcher the pages are for admins only, and asks nothing of the admin routes', async () => {
    const calls = stubApi({}, { ...ME_ADMIN, user: { ...ME_ADMIN.user!, role: 'researcher' }, permissions: ['runs:read', 'runs:write', 'atlas:read'] });
    renderAdmin('/admin/keys');
    expect((await screen.findByTestId('admins-only')).textContent).toContain('your role (researcher) does not reach them');
    expect(calls.map((c) => c.url)).toEqual(['/api/v1/me']);
  });

  it('says mail goes through a real service when the catcher route answers 404', async () => {
    stubApi({ 'GET /api/v1/dev/mail': { status: 404, body: { error: { code: 'not_found', message: 'no route' } } } });
    renderAdmin('/admin/mail');
    expect((await screen.findByTestId('mail-real-service')).textContent).toContain('Mail is sent by a real mail service here');
  });

  it('lists caught mail newest first with subject, recipients and body', async () => {
    stubApi({
      'GET /api/v1/dev/mail': {
        status: 200,
        body: {
          messages: [
            { id: 1, from: 'cairn@localhost', to: ['ada@seminar.example'], subject: 'Run grid:5x5 finished', receivedAt: '2026-01-05T10:00:00.000Z', text: 'rank number established' },
            { id: 2, from: 'cairn@localhost', to: ['plans@joinery.example'], subject: 'A run was shared with you', receivedAt: '2026-01-06T10:00:00.000Z', text: 'open the link' },
          ],
        },
      },
    });
    renderAdmin('/admin/mail');
    const list = await screen.findByTestId('mail-list');
    const items = within(list).getAllByRole('listitem');
    expect(items[0]!.textContent).toContain('A run was shared with you');
    expect(items[0]!.textContent).toContain('to plans@joinery.example');
    expect(items[1]!.textContent).toContain('rank number established');
  });

  it("shows the server's message when the mail cannot be read", async () => {
    stubApi({ 'GET /api/v1/dev/mail': { status: 503, body: { error: { code: 'unavailable', message: 'the mail catcher is not answering' } } } });
    renderAdmin('/admin/mail');
    expect((await screen.findByRole('alert')).textContent).toBe('Could not read the caught mail: the mail catcher is not answering');
  });
});
