import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type Browser } from 'playwright-core';
import { startBuiltServer, type BuiltServer } from '../support/built-server';
import { launchChromium } from '../support/chromium';

let server: BuiltServer;
let browser: Browser;

beforeAll(async () => {
  server = await startBuiltServer();
  browser = await launchChromium(chromium);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('home page in Chromium', () => {
  it('shows that the server and its database are up, loading nothing from the network', async () => {
    const page = await browser.newPage();
    const origins = new Set<string>();
    page.on('request', (req) => origins.add(new URL(req.url()).origin));
    await page.goto(server.url);
    const status = page.getByTestId('health-status');
    await status.getByText('database reachable').waitFor({ timeout: 15_000 });
    expect(await status.textContent()).toMatch(/^Server up · database reachable/);
    expect(await page.title()).toBe('Cairn');
    // The shipped fonts are in use: the display face is one of our own files.
    const fontsReady = await page.evaluate(async () => {
      await document.fonts.ready;
      return [...document.fonts].filter((f) => f.status === 'loaded').map((f) => f.family);
    });
    expect(fontsReady.some((f) => f.includes('Inter'))).toBe(true);
    expect([...origins]).toEqual([server.url]);
  });

  it('answers an unknown address with the app, which says so in words', async () => {
    const page = await browser.newPage();
    const res = await page.goto(`${server.url}/no/such/page`);
    expect(res?.status()).toBe(200);
    await page.getByText('Nothing here').waitFor();
  });
});
