import { rmSync } from 'node:fs';
import { chromium, type Browser, type Page } from 'playwright-core';
import { buildPicturePage } from './build-page';
import { launchChromium } from '@cairn/tests/chromium';
import type { BenchGlobal, PictureBench } from './page/protocol';
import { preview } from 'vite';

export interface PictureSession {
  page: Page;
  browser: Browser;
  close: () => Promise<void>;
}

/** The viewport the picture is measured in: a common laptop screen, one device pixel per CSS pixel. */
export const VIEWPORT = { width: 1280, height: 900 };

/** Builds the bench page, serves it on loopback and opens it in Debian's Chromium. */
export async function openPictureSession(): Promise<PictureSession> {
  const dir = await buildPicturePage();
  // Vite's own preview server for the build, on a free loopback port (module scripts need http).
  const server = await preview({ configFile: false, logLevel: 'warn', build: { outDir: dir }, preview: { host: '127.0.0.1', port: 0, strictPort: true } });
  const url = server.resolvedUrls?.local[0];
  if (!url) throw new Error('the preview server named no loopback address');
  const browser = await launchChromium(chromium);
  const close = async () => {
    await browser.close();
    await server.close();
    rmSync(dir, { recursive: true, force: true });
  };
  try {
    const page = await browser.newPage({ viewport: VIEWPORT, deviceScaleFactor: 1 });
    await page.goto(url);
    await page.waitForSelector('body[data-ready]', { state: 'attached' });
    return { page, browser, close };
  } catch (err) {
    await close();
    throw err;
  }
}

/** Calls one method of the page's `pictureBench` (page.evaluate runs the function in the page, so it names the method rather than closing over anything). */
export async function callBench<K extends keyof PictureBench>(page: Page, method: K, ...args: Parameters<PictureBench[K]>): Promise<Awaited<ReturnType<PictureBench[K]>>> {
  const out = await page.evaluate(
    ([name, params]) => {
      const api = (globalThis as unknown as BenchGlobal).pictureBench;
      return (api[name] as (...a: unknown[]) => unknown).apply(api, params);
    },
    [method, args] as [K, unknown[]],
  );
  return out as Awaited<ReturnType<PictureBench[K]>>;
}
