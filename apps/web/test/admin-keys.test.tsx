import type { ApiKeyInfo } from '@cairn/schema';
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
const users = [
  { id: id(1), login: 'root-admin', displayName: null, email: null, role: 'admin', createdAt: '2026-01-01T09:00:00.000Z' },
  { id: id(2), login: 'joinery-bot', displayName: 'Workshop planner', email: 'plans@joinery.example', role: 'researcher', createdAt: '2026-01-02T09:00:00.000Z' },
];
const key = (n: number, over: Partial<ApiKeyInfo> = {}): ApiKeyInfo => ({
  id: id(100 + n),
  name: `script ${n}`,
  prefix: `cairn_k${n}ab`,
  scopes: ['runs:read'],
  owner: { id: id(2), login: 'joinery-bot' },
  createdAt: '2026-01-03T09:00:00.000Z',
  lastUsedAt: null,
  revokedAt: null,
  ...over,
});

interface Call {
  method: string;
  path: string;
  body: unknown;
  headers: Record<string, string>;
}

function stubAdminApi() {
  const calls: Call[] = [];
  let keys: ApiKeyInfo[] = [key(1), key(2, { revokedAt: '2026-01-04T09:00:00.000Z', lastUsedAt: '2026-01-03T12:00:00.000Z' })];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(String(input), 'http://cairn.test');
      const method = init?.method ?? 'GET';
      calls.push({ method, path: url.pathname, body: init?.body ? JSON.parse(String(init.body)) : undefined, headers: (init?.headers ?? {}) as Record<string, string> });
      const reply = (status: number, body?: unknown) => new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
      const route = `${method} ${url.pathname}`;
      if (route === 'GET /api/v1/me') return reply(200, admin);
      if (route === 'GET /api/v1/users') return reply(200, { users });
      if (route === 'GET /api/v1/keys') return reply(200, { keys });
      if (route === 'POST /api/v1/keys') {
        const made = key(3, { name: 'nightly plan export', scopes: ['runs:read', 'runs:write'] });
        keys = [made, ...keys];
        return reply(201, { key: made, secret: 'cairn_k3ab_s3cr3t-value-only-once' });
      }
      if (method === 'DELETE' && url.pathname.startsWith('/api/v1/keys/')) {
        keys = keys.map((k) => (url.pathname.endsWith(k.id) ? { ...k, revokedAt: '2026-01-06T09:00:00.000Z' } : k));
        return reply(204);
      }
      return reply(404, { error: { code: 'not_found', message: `no route ${route}` } });
    }),
  );
  return calls;
}

async function renderKeys() {
  const router = createMemoryRouter([{ path: '/admin/*', element: <AdminPage /> }], { initialEntries: ['/admin/keys'] });
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } })}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return screen.findByTestId('keys-table');
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('Admin · API keys', () => {
  it('lists keys by prefix with owner, scopes and state', async () => {
    stubAdminApi();
    const table = await renderKeys();
    const rows = within(table).getAllByTestId('key-row') as HTMLTableRowElement[];
    expect(rows.map((r) => r.cells[1]!.textContent)).toEqual(['cairn_k1ab…', 'cairn_k2ab…']);
    expect(rows[0]!.textContent).toContain('joinery-bot');
    expect(rows[0]!.textContent).toContain('never');
    expect(within(rows[0]!).getByRole('button', { name: 'Revoke script 1 (cairn_k1ab)' })).toBeTruthy();
    expect(rows[1]!.textContent).toMatch(/revoked/);
    expect(within(rows[1]!).queryByRole('button')).toBeNull();
  });

  it('checks the form, sends the request, and shows the secret once', async () => {
    const calls = stubAdminApi();
    const writeText = vi.fn(async () => {});
    Object.defineProperty(navigator, 'clipboard', { value: { writeText }, configurable: true });
    await renderKeys();
    await screen.findByRole('option', { name: 'joinery-bot (researcher)' });

    fireEvent.click(screen.getByRole('checkbox', { name: /runs:read/ }));
    fireEvent.click(screen.getByRole('button', { name: 'Make key' }));
    expect(await screen.findByText('Pick the member the key acts for')).toBeTruthy();
    expect(screen.getByText('Give the key a name, such as "seminar tables script"')).toBeTruthy();
    expect(screen.getByText('give at least one scope')).toBeTruthy();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);

    fireEvent.change(screen.getByLabelText('Acts for'), { target: { value: id(2) } });
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'nightly plan export' } });
    fireEvent.click(screen.getByRole('checkbox', { name: /runs:read/ }));
    fireEvent.click(screen.getByRole('checkbox', { name: /runs:write/ }));
    fireEvent.click(screen.getByRole('button', { name: 'Make key' }));

    const box = await screen.findByTestId('key-secret');
    const post = calls.find((c) => c.method === 'POST')!;
    expect(post.body).toEqual({ userId: id(2), name: 'nightly plan export', scopes: ['runs:read', 'runs:write'] });
    expect(post.headers['x-csrf-token']).toBe('csrf-admin');
    expect((within(box).getByLabelText('Secret of the new key') as HTMLInputElement).value).toBe('cairn_k3ab_s3cr3t-value-only-once');
    expect(box.textContent).toContain('it will not be shown again');
    fireEvent.click(within(box).getByRole('button', { name: 'Copy secret' }));
    await waitFor(() => expect(writeText).toHaveBeenCalledWith('cairn_k3ab_s3cr3t-value-only-once'));
    expect(await within(box).findByText('Copied to the clipboard.')).toBeTruthy();

    // The list refreshes with the new key's prefix, never its secret.
    const table = screen.getByTestId('keys-table');
    await waitFor(() => expect((within(table).getAllByTestId('key-row') as HTMLTableRowElement[])[0]!.cells[1]!.textContent).toBe('cairn_k3ab…'));
    expect(table.textContent).not.toContain('s3cr3t');

    fireEvent.click(screen.getByRole('button', { name: /I have stored it/ }));
    expect(screen.queryByTestId('key-secret')).toBeNull();
    expect(document.body.textContent).not.toContain('s3cr3t');
  });

  it('asks before revoking, and revokes with DELETE only once confirmed', async () => {
    const calls = stubAdminApi();
    await renderKeys();
    const deletes = () => calls.filter((c) => c.method === 'DELETE');

    fireEvent.click(screen.getByRole('button', { name: 'Revoke script 1 (cairn_k1ab)' }));
    const dialog = screen.getByRole('alertdialog');
    expect(dialog.textContent).toContain('cairn_k1ab…');
    expect(dialog.textContent).toContain('cannot be undone');
    expect(document.activeElement).toBe(within(dialog).getByRole('button', { name: 'Keep it' }));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(deletes()).toHaveLength(0);

    fireEvent.click(screen.getByRole('button', { name: 'Revoke script 1 (cairn_k1ab)' }));
    fireEvent.click(within(screen.getByRole('alertdialog')).getByRole('button', { name: 'Revoke key' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    expect(deletes().map((c) => c.path)).toEqual([`/api/v1/keys/${id(101)}`]);
    expect(deletes()[0]!.headers['x-csrf-token']).toBe('csrf-admin');
    // Refetched: the key now shows as revoked, with no button left.
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Revoke script 1 (cairn_k1ab)' })).toBeNull());
  });
});
