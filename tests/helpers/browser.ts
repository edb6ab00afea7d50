import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';
import type { Browser, BrowserContext } from 'playwright-core';

/** Flags for Debian's chromium that keep it headless and off this machine's closed network. */
export const CHROMIUM_FLAGS: readonly string[] = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Debian's chromium, never a downloaded browser. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    args: [...CHROMIUM_FLAGS],
  });
}

/**
 * A phone-sized context (360 × 740, touch) as a contractor on site would have; British English
 * (metric) unless another locale is given.
 */
export async function phoneContext(
  browser: Browser,
  baseURL: string,
  locale = 'en-GB',
): Promise<BrowserContext> {
  return browser.newContext({
    baseURL,
    viewport: { width: 360, height: 740 },
    deviceScaleFactor: 2,
    isMobile: true,
    hasTouch: true,
    locale,
  });
}

/** A temp folder for downloads and screenshots. */
export function tempDir(prefix = 'dw-browser-'): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), prefix));
}
