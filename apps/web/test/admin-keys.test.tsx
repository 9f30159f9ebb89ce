import type { ApiKeyInfo } from '@cairn/schema';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AdminPage } from '../src/pages/AdminPage';
import { json, ME_ADMIN, on, renderRoutes, stubFetch, uuid as id, type Route } from './support/render-page';

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

/** The admin routes over two keys, the second revoked: POST adds key 3, DELETE revokes the key it names. */
function stubAdminApi() {
  let keys: ApiKeyInfo[] = [key(1), key(2, { revokedAt: '2026-01-04T09:00:00.000Z', lastUsedAt: '2026-01-03T12:00:00.000Z' })];
  const revoke: Route = (url, init) => {
    if (init?.method !== 'DELETE' || !url.pathname.startsWith('/api/v1/keys/')) return undefined;
    keys = keys.map((k) => (url.pathname.endsWith(k.id) ? { ...k, revokedAt: '2026-01-06T09:00:00.000Z' } : k));
    return json(204);
  };
  return stubFetch(
    on('GET', '/api/v1/me', () => json(200, ME_ADMIN)),
    on('GET', '/api/v1/users', () => json(200, { users })),
    on('GET', '/api/v1/keys', () => json(200, { keys })),
    on('POST', '/api/v1/keys', () => {
      const made = key(3, { name: 'nightly plan export', scopes: ['runs:read', 'runs:write'] });
      keys = [made, ...keys];
      return json(201, { key: made, secret: 'cairn_k3ab_s3cr3t-value-only-once' });
    }),
    revoke,
  );
}

async function renderKeys() {
  renderRoutes([{ path: '/admin/*', element: <AdminPage /> }], '/admin/keys');
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
    expect(deletes().map((c) => c.url)).toEqual([`/api/v1/keys/${id(101)}`]);
    expect(deletes()[0]!.headers['x-csrf-token']).toBe('csrf-admin');
    // Refetched: the key now shows as revoked, with no button left.
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Revoke script 1 (cairn_k1ab)' })).toBeNull());
  });
});
