import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

// Ports 16500–16549 belong to these tests.
let app: StartedApp;
let browser: Browser;
let context: BrowserContext;

beforeAll(async () => {
  [app, browser] = await Promise.all([startApp(16500), launchBrowser()]);
  context = await phoneContext(browser, app.url);
});

afterAll(async () => {
  await context?.close();
  await browser?.close();
  await app?.stop();
});

/** Visit once online and wait until the service worker has installed and controls the page. */
async function visitUntilControlled(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, null, {
    timeout: 20_000,
  });
}

async function resultText(page: Page): Promise<string> {
  return (await page.locator('section[aria-label="Result"]').textContent()) ?? '';
}

describe('offline quick check', () => {
  test('does render and compute after one visit with the network off', async () => {
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    await visitUntilControlled(page, '/check');
    const cacheNames = await page.evaluate(() => caches.keys());
    expect(cacheNames.some((n) => n.includes('precache'))).toBe(true);

    await context.setOffline(true);
    await page.reload();
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toContain(
      'Quick check',
    );
    // The island hydrated from cached chunks: a verdict is shown and reacts to new input.
    await page.locator('[data-verdict]').first().waitFor({ timeout: 10_000 });
    const before = await resultText(page);
    const field = page.locator('input[inputmode="decimal"]').first();
    const old = Number((await field.inputValue()).replace(',', '.'));
    await field.fill(String(old > 0 ? old * 3 : 5));
    await page.waitForFunction(
      (prev) => document.querySelector('section[aria-label="Result"]')?.textContent !== prev,
      before,
      { timeout: 5_000 },
    );
    expect(await resultText(page)).not.toBe(before);
    expect(errors).toEqual([]);
    await context.setOffline(false);
  });

  test('does not keep other pages or the API offline', async () => {
    const page = await context.newPage();
    await visitUntilControlled(page, '/check');
    const cached = await page.evaluate(async () => {
      const urls: string[] = [];
      for (const name of await caches.keys()) {
        for (const req of await (await caches.open(name)).keys())
          urls.push(new URL(req.url).pathname);
      }
      return urls;
    });
    expect(cached).toContain('/check');
    expect(cached.filter((u) => /^\/(api|app|support)(\/|$)/.test(u))).toEqual([]);
    expect(cached.filter((u) => u.startsWith('/guides'))).toEqual([]);

    await context.setOffline(true);
    const api = await page.evaluate(() =>
      fetch('/api/health').then(
        () => 'answered',
        () => 'failed',
      ),
    );
    expect(api).toBe('failed');
    await context.setOffline(false);
  });
});
