import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AdminPage } from '../src/pages/AdminPage';

const id = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

const admin = {
  user: { id: id(1), login: 'root-admin', displayName: null, email: null, role: 'admin', notifyOnFinish: false },
  via: 'session',
  permissions: ['runs:read', 'runs:write', 'atlas:read', 'admin'],
  csrfToken: 'csrf-admin',
  signIn: { provider: 'local' },
};
const member = (n: number, login: string, role: string) => ({ id: id(n), login, displayName: null, email: `${login}@seminar.example`, role, createdAt: '2026-01-02T09:00:00.000Z' });

interface Call {
  method: string;
  path: string;
  body: unknown;
}
type Reply = { status: number; body?: unknown };

function stubApi(routes: Record<string, Reply | ((body: unknown) => Reply)>, me: unknown = admin): Call[] {
  const calls: Call[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(String(input), 'http://cairn.test');
      const method = init?.method ?? 'GET';
      const body = init?.body ? JSON.parse(String(init.body)) : undefined;
      calls.push({ method, path: url.pathname, body });
      const r = url.pathname === '/api/v1/me' ? { status: 200, body: me } : routes[`${method} ${url.pathname}`];
      const reply = typeof r === 'function' ? r(body) : (r ?? { status: 404, body: { error: { code: 'not_found', message: 'no route' } } });
      return new Response(reply.body === undefined ? null : JSON.stringify(reply.body), { status: reply.status, headers: { 'content-type': 'application/json' } });
    }),
  );
  return calls;
}

function renderAdmin(path: string) {
  const router = createMemoryRouter([{ path: '/admin/*', element: <AdminPage /> }], { initialEntries: [path] });
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } })}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return router;
}

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
    expect(calls.find((c) => c.method === 'PATCH')).toEqual({ method: 'PATCH', path: `/api/v1/users/${id(2)}`, body: { role: 'researcher' } });
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
    const calls = stubApi({}, { ...admin, user: { ...admin.user, role: 'researcher' }, permissions: ['runs:read', 'runs:write', 'atlas:read'] });
    renderAdmin('/admin/keys');
    expect((await screen.findByTestId('admins-only')).textContent).toContain('your role (researcher) does not reach them');
    expect(calls.map((c) => c.path)).toEqual(['/api/v1/me']);
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
