import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../src/index';
import { defaultWebDist } from '../src/web-dist';
import { serveApp, type ServedApp } from './support/listen';
import { testContext } from './support/test-context';
import { unreachableDatabase } from './support/test-database';

// Headers need no database: the app runs against an address where nothing listens.
const db = unreachableDatabase();
const webDist = defaultWebDist();

const start = (env: Record<string, string> = {}): Promise<ServedApp> => serveApp(createApp(testContext(db, { webDist }, env)));

/** The policy as directive -> sources. */
function policyOf(header: string | null): Map<string, string[]> {
  const policy = new Map<string, string[]>();
  for (const part of (header ?? '').split(';')) {
    const [name, ...sources] = part.trim().split(/\s+/);
    if (name) policy.set(name, sources);
  }
  return policy;
}

let plain: ServedApp;

beforeAll(async () => {
  plain = await start();
});
afterAll(() => plain?.close());

describe('security headers', () => {
  it('sends a strict Content-Security-Policy, nosniff and no framing on API answers', async () => {
    const res = await fetch(`${plain.url}/api/health`);
    const policy = policyOf(res.headers.get('content-security-policy'));
    expect(policy.get('default-src')).toEqual(["'self'"]);
    expect(policy.get('script-src')).toEqual(["'self'"]);
    expect(policy.get('script-src-attr')).toEqual(["'none'"]);
    expect(policy.get('style-src')).toEqual(["'self'"]);
    expect(policy.get('font-src')).toEqual(["'self'", 'data:']);
    expect(policy.get('connect-src')).toEqual(["'self'"]);
    expect(policy.get('object-src')).toEqual(["'none'"]);
    expect(policy.get('frame-ancestors')).toEqual(["'none'"]);
    for (const sources of policy.values()) {
      expect(sources).not.toContain("'unsafe-inline'");
      expect(sources).not.toContain("'unsafe-eval'");
    }
    expect(res.headers.get('x-content-type-options')).toBe('nosniff');
    expect(res.headers.get('x-frame-options')).toBe('DENY');
    expect(res.headers.get('referrer-policy')).toBe('no-referrer');
    expect(res.headers.get('x-powered-by')).toBeNull();
    // Over plain http the browser ignores HSTS, and upgrading requests would break the loopback app.
    expect(res.headers.get('strict-transport-security')).toBeNull();
    expect(policy.has('upgrade-insecure-requests')).toBe(false);
  });

  it('adds HSTS and upgrade-insecure-requests when the public URL is https', async () => {
    const secure = await start({ CAIRN_PUBLIC_URL: 'https://cairn.example' });
    try {
      const res = await fetch(`${secure.url}/api/health`);
      expect(res.headers.get('strict-transport-security')).toMatch(/^max-age=\d+; includeSubDomains$/);
      expect(policyOf(res.headers.get('content-security-policy')).has('upgrade-insecure-requests')).toBe(true);
    } finally {
      await secure.close();
    }
  });

  it('lets the built web app load under the policy: no inline script or style, every asset from this origin', async () => {
    expect(existsSync(join(webDist, 'index.html')), 'build the web app first (pnpm build)').toBe(true);
    const res = await fetch(`${plain.url}/`);
    expect(res.status).toBe(200);
    expect(policyOf(res.headers.get('content-security-policy')).get('script-src')).toEqual(["'self'"]);
    const html = await res.text();
    expect(html).toBe(readFileSync(join(webDist, 'index.html'), 'utf8'));

    const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)];
    expect(scripts.length).toBeGreaterThan(0);
    for (const [, attributes, body] of scripts) {
      expect(body!.trim(), 'inline script').toBe('');
      expect(attributes).toMatch(/\bsrc="[^"]+"/);
    }
    expect(html).not.toMatch(/<style\b/i);
    expect(html).not.toMatch(/\sstyle="/i);
    expect(html).not.toMatch(/\son[a-z]+="/i);

    const assets = [...html.matchAll(/\b(?:src|href)="([^"]+)"/g)].map((m) => m[1]!);
    const stylesheets: string[] = [];
    for (const asset of assets) {
      // Same origin: a path on this server, not another host.
      expect(asset, asset).toMatch(/^\/(?!\/)/);
      const got = await fetch(`${plain.url}${asset}`);
      expect(got.status, asset).toBe(200);
      if (asset.endsWith('.css')) stylesheets.push(await got.text());
      else await got.arrayBuffer();
    }
    // Fonts and images the styles name are from this origin, or data: URLs of the kinds the policy allows.
    const policy = policyOf(res.headers.get('content-security-policy'));
    for (const css of stylesheets) {
      for (const [, url] of css.matchAll(/url\(\s*["']?([^"')]+)["']?\s*\)/g)) {
        if (url!.startsWith('data:')) {
          const kind = url!.startsWith('data:font/') ? 'font-src' : 'img-src';
          expect(policy.get(kind), `${kind} for ${url!.slice(0, 30)}`).toContain('data:');
          continue;
        }
        expect(url, url).toMatch(/^\/(?!\/)/);
        const got = await fetch(`${plain.url}${url}`);
        expect(got.status, url).toBe(200);
        await got.arrayBuffer();
      }
    }
  });
});
