import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { csrfTokenOf, DEMO, screenshot, startE2eApp, type E2eApp } from '../support/e2e-app';

// What the roles allow, seen in Debian's Chromium against the built server and PostgreSQL: the admin
// makes and revokes an API key on the admin keys page (the key is tried from outside the browser), and a
// viewer finds no way to start a run, in the page or through the API. Build first: pnpm -s build.

let app: E2eApp;

beforeAll(async () => {
  app = await startE2eApp();
}, 60_000);
afterAll(async () => {
  await app?.stop();
});

describe('roles in Chromium', () => {
  it('lets the admin make a key for a member, shows its secret once, and revokes it so the API refuses it', async () => {
    const { page } = await app.signedIn(DEMO.admin.login);
    expect(await page.getByTestId('account-role').textContent()).toBe('admin');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Admin', exact: true }).click();
    await page.getByRole('navigation', { name: 'Admin sections' }).getByRole('link', { name: 'API keys' }).click();
    await page.waitForURL(`${app.url}/admin/keys`);

    const member = page.getByLabel('Acts for');
    await member.locator('option', { hasText: `${DEMO.researcher.login} (researcher)` }).waitFor({ state: 'attached' });
    await member.selectOption({ label: `${DEMO.researcher.login} (researcher)` });
    await page.getByLabel('Name', { exact: true }).fill('e2e nightly tables');
    // Only runs:read (the form's default): the key can read runs, not start them.
    expect(await page.getByRole('checkbox', { name: /^runs:read/ }).isChecked()).toBe(true);
    expect(await page.getByRole('checkbox', { name: /^runs:write/ }).isChecked()).toBe(false);
    await page.getByRole('button', { name: 'Make key' }).click();

    const box = page.getByTestId('key-secret');
    await box.waitFor();
    expect(await box.getByRole('heading').textContent()).toBe(`Key “e2e nightly tables” for ${DEMO.researcher.login}`);
    const secret = await page.getByLabel('Secret of the new key').inputValue();
    expect(secret).toMatch(/^cairn_\S{16,}$/);

    const listed = await app.api('/api/v1/runs', { key: secret });
    expect(listed.status).toBe(200);
    expect(Array.isArray(listed.body.runs)).toBe(true);
    const me = await app.api('/api/v1/me', { key: secret });
    expect(me.body).toMatchObject({ via: 'key', user: { login: DEMO.researcher.login }, permissions: ['runs:read'] });
    // The scope narrows the researcher's role: no runs:write through this key.
    const start = await app.api('/api/v1/runs', { method: 'POST', key: secret, body: { spec: 'path:5' } });
    expect(start.status).toBe(403);
    expect(start.body.error.message).toContain('lacks the scope runs:write');

    // Hidden for good once stored: the page keeps no copy.
    await page.getByRole('button', { name: /I have stored it/ }).click();
    expect(await box.count()).toBe(0);
    expect(await page.content()).not.toContain(secret);

    const row = page.getByTestId('key-row').filter({ hasText: 'e2e nightly tables' });
    expect(await row.textContent()).toContain(secret.slice(0, 8));
    await row.getByRole('button', { name: /^Revoke e2e nightly tables/ }).click();
    const confirm = page.getByTestId('revoke-confirm');
    await confirm.waitFor();
    expect(await confirm.textContent()).toContain(`of ${DEMO.researcher.login} stops working at once`);
    await confirm.getByRole('button', { name: 'Revoke key' }).click();
    await confirm.waitFor({ state: 'detached' });
    await row.getByText(/^revoked /).waitFor();
    expect(await row.getByRole('button', { name: /^Revoke/ }).count()).toBe(0);

    const refused = await app.api('/api/v1/runs', { key: secret });
    expect(refused.status).toBe(401);
    expect(refused.body.error).toMatchObject({ code: 'invalid_key', message: 'unknown or revoked API key' });
    // The demo key of the same member still works: only this key was revoked.
    expect((await app.api('/api/v1/runs')).status).toBe(200);
    await screenshot(page, 'admin-keys');
  });

  it('gives a viewer no way to start a run: no New run link, no form on /runs/new, and the API refuses', async () => {
    const { page } = await app.signedIn(DEMO.viewer.login);
    expect(await page.getByTestId('account-name').textContent()).toContain(DEMO.viewer.name);
    expect(await page.getByTestId('account-role').textContent()).toBe('viewer');
    const nav = page.getByRole('navigation', { name: 'Main' });
    // The viewer reads runs (the Runs link is there), so the missing links are the role's doing, not a signed-out nav.
    await nav.getByRole('link', { name: 'Runs', exact: true }).waitFor();
    expect(await nav.getByRole('link', { name: 'New run' }).count()).toBe(0);
    expect(await nav.getByRole('link', { name: 'Verify' }).count()).toBe(0);
    expect(await nav.getByRole('link', { name: 'Admin' }).count()).toBe(0);

    await nav.getByRole('link', { name: 'Runs', exact: true }).click();
    await page.getByRole('heading', { name: 'Runs', level: 1 }).waitFor();
    expect(await page.getByRole('link', { name: 'New run' }).count()).toBe(0);

    await page.goto(`${app.url}/runs/new`);
    await page.getByText('Your role (viewer) may read runs but not start them.').waitFor();
    expect(await page.getByRole('form', { name: 'New run' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Start the run' }).count()).toBe(0);
    await screenshot(page, 'new-run-viewer');

    // The API says no to the viewer's own session, with a valid CSRF token, so the refusal is the role's.
    const csrf = await csrfTokenOf(page);
    expect(csrf).toBeTruthy();
    const refused = await page.evaluate(async (token) => {
      const res = await fetch('/api/v1/runs', {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-csrf-token': token! },
        body: JSON.stringify({ spec: 'path:5' }),
      });
      return { status: res.status, body: (await res.json()) as { error: { code: string; message: string } } };
    }, csrf);
    expect(refused.status).toBe(403);
    expect(refused.body.error).toMatchObject({ code: 'forbidden', message: 'the viewer role may not do this (needs runs:write)' });
    // Reading is allowed to the same session: the refusal above is about starting runs only.
    expect(await page.evaluate(async () => (await fetch('/api/v1/runs')).status)).toBe(200);

    // Signing out ends the session: the menu offers sign-in again and the API no longer knows the viewer.
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: /^Sign in/ }).first().waitFor();
    expect(await page.getByTestId('account-name').count()).toBe(0);
    expect(await page.evaluate(async () => (await fetch('/api/v1/runs')).status)).toBe(401);
  });

  it('sent nothing off this machine: every request of every page went to 127.0.0.1', () => {
    expect(app.requested.some((u) => u.startsWith(`${app.url}/api/v1/`))).toBe(true);
    expect(app.offLoopback).toEqual([]);
  });

  it('raised no uncaught error in any page, and logged nothing but the refusals the tests asked for', () => {
    expect(app.pageErrors).toEqual([]);
    // The browser logs each non-2xx answer as "Failed to load resource"; those are the tests' refused
    // requests. Anything else (a CSP refusal, a React error) would show here.
    expect(app.consoleErrors.filter((m) => !/Failed to load resource: the server responded with a status of 4\d\d/.test(m))).toEqual([]);
  });
});
