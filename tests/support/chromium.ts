import type { Browser, BrowserType } from 'playwright-core';

/** Debian's Chromium (never a downloaded build), with the network chatter of a first start turned off. */
export function launchChromium(type: BrowserType): Promise<Browser> {
  return type.launch({
    executablePath: process.env.CAIRN_CHROMIUM ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--disable-dev-shm-usage',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
    ],
  });
}
