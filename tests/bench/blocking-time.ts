/**
 * Blocking time measured rather than simulated (`npm run bench:blocking`; not a test): each
 * calculator page is loaded in Debian's chromium as a US phone with DevTools' real 4x CPU
 * throttling, and the part over 50 ms of every long task (the browser's longtask entries) is
 * summed until the calculator is ready and 1.5 s have passed. Lighthouse's score simulates the
 * same quantity from one trace; this is the check on it. BENCH_PAGES, BENCH_LOADS (default 7) and
 * BENCH_LOCALE (default en-US, which hydrates into US units; en-GB stays metric).
 */
import type { Browser } from 'playwright-core';
import { launchBrowser } from '../helpers/browser';
import { startApp } from '../helpers/server';

const PAGES = (process.env.BENCH_PAGES ?? '/check,/siphon,/gravity-line,/drain').split(',');
const LOADS = Number(process.env.BENCH_LOADS) || 7;

async function blockingMs(browser: Browser, url: string): Promise<number> {
  const context = await browser.newContext({
    viewport: { width: 360, height: 740 },
    locale: process.env.BENCH_LOCALE ?? 'en-US',
  });
  try {
    const page = await context.newPage();
    await page.addInitScript(() => {
      const w = window as unknown as { __long: number[] };
      w.__long = [];
      new PerformanceObserver((list) => {
        for (const e of list.getEntries()) w.__long.push(e.duration);
      }).observe({ type: 'longtask', buffered: true });
    });
    const cdp = await context.newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
    await page.goto(url);
    await page.waitForFunction(() => document.documentElement.dataset.calcReady === '1');
    await page.waitForTimeout(1500);
    const long = await page.evaluate(() => (window as unknown as { __long: number[] }).__long);
    return Math.round(long.reduce((sum, d) => sum + Math.max(0, d - 50), 0));
  } finally {
    await context.close();
  }
}

async function main(): Promise<void> {
  const app = await startApp(18040);
  const browser = await launchBrowser();
  try {
    console.log(
      `blocking time, ms, ${LOADS} loads a page at 4x CPU throttling (median; all sorted)`,
    );
    for (const path of PAGES) {
      const all: number[] = [];
      for (let i = 0; i < LOADS; i++) all.push(await blockingMs(browser, `${app.url}${path}`));
      all.sort((a, b) => a - b);
      console.log(
        `${path.padEnd(14)} ${String(all[all.length >> 1]).padStart(5)}   ${all.join(' ')}`,
      );
    }
  } finally {
    await browser.close();
    await app.stop();
  }
}

void main();
