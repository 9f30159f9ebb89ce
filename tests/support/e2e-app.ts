import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { createDataSource, createLogger, Database, loadDemoData } from '@cairn/server';
import { startBuiltServer, type BuiltServer } from './built-server';
import { launchChromium } from './chromium';
import { databaseUrl } from './test-env';

/** Where the end-to-end tests leave their full-page screenshots (tests/e2e/screenshots/<name>.png). */
export const screenshotDir = fileURLToPath(new URL('../e2e/screenshots/', import.meta.url));

/** The demo members and their roles (apps/server/src/dev/demo-identities.ts; invented, demo only). */
export const DEMO = {
  admin: { login: 'ines-marlow', name: 'Inès Marlow', role: 'admin' },
  researcher: { login: 'tobias-quell', name: 'Tobias Quell', role: 'researcher' },
  viewer: { login: 'guest-reader', name: 'Guest Reader', role: 'viewer' },
} as const;

export interface E2eApp {
  /** The built server's own URL, which is also its CAIRN_PUBLIC_URL (so sign-in and share links come back here). */
  url: string;
  server: BuiltServer;
  browser: Browser;
  /** The demo researcher's (tobias-quell's) API key, from loadDemoData. */
  apiKey: string;
  /** Every http(s)/ws(s) address any page of any context asked for that is not on 127.0.0.1. */
  offLoopback: string[];
  /** Every address asked for, to show that the record is not empty by accident. */
  requested: string[];
  /** Uncaught exceptions in any page, and console errors (a refused CSP rule shows up there too). */
  pageErrors: string[];
  consoleErrors: string[];
  /** A fresh context with the loopback guard on; signed out. */
  newContext: () => Promise<BrowserContext>;
  /** A fresh context signed in as a demo member through the app's sign-in link and the local provider page. */
  signedIn: (login: string) => Promise<{ context: BrowserContext; page: Page }>;
  /** fetch against the server with the API key (or another Bearer secret), JSON in and out. */
  api: (path: string, init?: { method?: string; body?: unknown; key?: string }) => Promise<{ status: number; body: any }>;
  stop: () => Promise<void>;
}

const isNetwork = (u: URL) => ['http:', 'https:', 'ws:', 'wss:'].includes(u.protocol);

/**
 * Loads the demo members and key into the test database, starts the built server (its fake GitHub and
 * mail catcher included, runs computed in-process) on a port chosen first so CAIRN_PUBLIC_URL can name
 * it, and launches Debian's Chromium. Every context it makes records (and blocks) any request that would
 * leave 127.0.0.1.
 */
export async function startE2eApp(extraEnv: Record<string, string> = {}): Promise<E2eApp> {
  mkdirSync(screenshotDir, { recursive: true });
  const db = new Database(createDataSource(databaseUrl()), createLogger('silent'));
  let apiKey: string;
  try {
    apiKey = (await loadDemoData(await db.connect())).apiKey;
  } finally {
    await db.close();
  }
  const server = await startBuiltServer(
    {
      CAIRN_RUN_CONCURRENCY: '1',
      // Mail for a finished run only after a minute: none of these short runs sends one.
      CAIRN_MAIL_AFTER_SECONDS: '60',
      ...extraEnv,
    },
    { publicUrlIsOwn: true },
  );
  const publicUrl = server.url;
  const browser = await launchChromium(chromium);
  const offLoopback: string[] = [];
  const requested: string[] = [];
  const pageErrors: string[] = [];
  const consoleErrors: string[] = [];
  const contexts: BrowserContext[] = [];

  const newContext = async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    contexts.push(context);
    await context.route('**', (route) => {
      const u = new URL(route.request().url());
      if (isNetwork(u) && u.hostname !== '127.0.0.1') {
        offLoopback.push(u.href);
        return route.abort('blockedbyclient');
      }
      return route.continue();
    });
    context.on('request', (req) => {
      const u = new URL(req.url());
      if (!isNetwork(u)) return;
      requested.push(u.href);
      if (u.hostname !== '127.0.0.1' && !offLoopback.includes(u.href)) offLoopback.push(u.href);
    });
    context.on('page', (page) => {
      page.on('websocket', (ws) => {
        const u = new URL(ws.url());
        requested.push(u.href);
        if (u.hostname !== '127.0.0.1') offLoopback.push(u.href);
      });
      page.on('pageerror', (err) => pageErrors.push(`${page.url()}: ${err.message}`));
      page.on('console', (msg) => {
        if (msg.type() === 'error') consoleErrors.push(`${page.url()}: ${msg.text()}`);
      });
    });
    return context;
  };

  const signedIn = async (login: string) => {
    const context = await newContext();
    const page = await context.newPage();
    await page.goto(publicUrl);
    // The account menu offers the local provider while signed out: "Sign in (local)".
    await page.getByRole('link', { name: /^Sign in/ }).first().click();
    // The provider's page: one button per demo identity, each marked data-login.
    await page.waitForURL((u) => u.pathname === '/login/oauth/authorize');
    await page.locator(`button[data-login="${login}"]`).click();
    await page.waitForURL((u) => u.origin === publicUrl && !u.pathname.startsWith('/api/'));
    await page.getByTestId('account-role').waitFor({ timeout: 15_000 });
    return { context, page };
  };

  const api: E2eApp['api'] = async (path, init = {}) => {
    const headers: Record<string, string> = { accept: 'application/json', authorization: `Bearer ${init.key ?? apiKey}` };
    if (init.body !== undefined) headers['content-type'] = 'application/json';
    const res = await fetch(`${publicUrl}${path}`, { method: init.method ?? 'GET', headers, body: init.body === undefined ? undefined : JSON.stringify(init.body) });
    const text = await res.text();
    let body: unknown = text;
    try {
      body = JSON.parse(text);
    } catch {
      /* not JSON: keep the text */
    }
    return { status: res.status, body };
  };

  return {
    url: publicUrl,
    server,
    browser,
    apiKey,
    offLoopback,
    requested,
    pageErrors,
    consoleErrors,
    newContext,
    signedIn,
    api,
    stop: async () => {
      for (const c of contexts) await c.close().catch(() => undefined);
      await browser.close().catch(() => undefined);
      await server.stop();
    },
  };
}

/** A full-page screenshot at tests/e2e/screenshots/<name>.png. */
export async function screenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: `${screenshotDir}${name}.png`, fullPage: true });
}

/** The session's CSRF token, as the web app learns it (GET /api/v1/me from inside the page). */
export async function csrfTokenOf(page: Page): Promise<string | null> {
  return page.evaluate(async () => ((await (await fetch('/api/v1/me')).json()) as { csrfToken: string | null }).csrfToken);
}

/** The labels of the ranking picture, read from the DOM: data-label of each data-vertex cell, by vertex. */
export async function pictureLabels(page: Page, root = page.getByTestId('ranking-picture')): Promise<number[]> {
  const pairs = await root.locator('[data-vertex]').evaluateAll((els) => els.map((e) => [Number(e.getAttribute('data-vertex')), Number(e.getAttribute('data-label'))] as const));
  const labels: number[] = [];
  for (const [v, l] of pairs) labels[v] = l;
  if (labels.length !== pairs.length || labels.some((l) => !Number.isInteger(l))) throw new Error(`the picture's vertices are not 0..${pairs.length - 1} with whole labels: ${JSON.stringify(pairs)}`);
  return labels;
}

/** The exact rank number the run page shows ("rank number N"); fails on an interval. */
export async function shownRankNumber(page: Page): Promise<number> {
  const text = (await page.getByTestId('run-value').textContent()) ?? '';
  const m = /^rank number (\d+)$/.exec(text.trim());
  if (!m) throw new Error(`the run page does not show an exact rank number: "${text}"`);
  return Number(m[1]);
}
