import { expect } from 'vitest';

/** The session cookie of an answer (`cairn.sid=...`), without its attributes. */
export const sessionCookieOf = (res: Response) => res.headers.getSetCookie().map((l) => l.split(';', 1)[0]!).find((p) => p.startsWith('cairn.sid='));

/**
 * Signs in on a built server through its local provider the way a browser does: start, choose the
 * identity on the provider's page, follow the callback. Returns the callback's answer (302, setting the
 * session cookie).
 */
export async function signInThroughLocalProvider(serverUrl: string, login: string, next?: string): Promise<Response> {
  const start = await fetch(`${serverUrl}/api/v1/auth/github${next ? `?next=${encodeURIComponent(next)}` : ''}`, { redirect: 'manual' });
  expect(start.status).toBe(302);
  const startCookie = sessionCookieOf(start)!;
  const authorizeUrl = start.headers.get('location')!;
  const page = await (await fetch(authorizeUrl)).text();
  const form = page.split('</form>').find((f) => f.includes(`data-login="${login}"`));
  expect(form, `the provider offers ${login}`).toBeDefined();
  const fields = new URLSearchParams();
  for (const m of form!.matchAll(/<input type="hidden" name="([^"]+)" value="([^"]*)">/g)) fields.set(m[1]!, m[2]!.replaceAll('&amp;', '&'));
  const chosen = await fetch(new URL('/login/oauth/authorize', authorizeUrl), { method: 'POST', body: fields, redirect: 'manual' });
  expect(chosen.status).toBe(302);
  const callback = chosen.headers.get('location')!;
  expect(callback.startsWith(`${serverUrl}/api/v1/auth/github/callback?`)).toBe(true);
  const done = await fetch(callback, { headers: { cookie: startCookie }, redirect: 'manual' });
  expect(done.status, await done.clone().text()).toBe(302);
  return done;
}
