import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

let app: StartedApp;
let browser: Browser;

beforeAll(async () => {
  [app, browser] = await Promise.all([startApp(17903), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('landing page in a phone browser', () => {
  test('shows the product, the cautions link, and no sideways scroll at 360 px', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    const errors: string[] = [];
    page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
    await page.goto('/');
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toContain('Will it run');
    expect(await page.getByRole('link', { name: /site cautions/i }).count()).toBeGreaterThanOrEqual(1);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    const font = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(font).toContain('Nunito Sans');
    expect(errors).toEqual([]);
  });
});
