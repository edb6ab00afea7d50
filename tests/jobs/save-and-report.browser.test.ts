import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { figure, openHydrated } from '../browser/calculators-helpers';
import { startJobsApp } from './app-fixture';
import type { JobsApp } from './app-fixture';

let t: JobsApp;
let browser: Browser;

beforeAll(async () => {
  t = await startJobsApp(16796);
  browser = await launchBrowser();
}, 120_000);
afterAll(async () => {
  await browser?.close();
  t?.db.close();
  await t?.app.stop();
});

describe('save a quick check to a job on a phone', () => {
  test('does save into a new job and download its report PDF', async () => {
    const context = await phoneContext(browser, t.app.url);
    // Signed in as the seeded Pro owner through a database session row (what sign-in creates).
    const cookie = t.as('usr_demo_owner').cookie.split('=');
    await context.addCookies([
      { name: cookie[0], value: cookie.slice(1).join('='), url: t.app.url },
    ]);
    const page = await context.newPage();
    await openHydrated(page, '/check');
    const [verdict, flow] = [await page.locator('[data-verdict]').first().innerText(), await figure(page, 'flow')];
    await page.getByRole('button', { name: 'Save to a job' }).click();
    await page.getByLabel('New job title').fill('Phone test pond');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await page.getByText('Saved to the job.').waitFor();
    await page.getByRole('link', { name: 'Open the job' }).click();
    await page.getByTestId('calculation').first().waitFor();
    // The job lists what the server's engine run gave, which is what the phone showed.
    const saved = page.getByTestId('calculation').filter({ hasText: 'Siphon' }).first();
    expect(verdict).toContain(await saved.getByTestId('calc-verdict').innerText());
    expect(await saved.locator('[data-calc-figure="Flow"]').innerText()).toBe(flow);
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(360);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByTestId('job-pdf').click(),
    ]);
    const file = await download.path();
    expect(fs.readFileSync(file!).subarray(0, 5).toString()).toBe('%PDF-');
    await context.close();
  }, 60_000);
});
