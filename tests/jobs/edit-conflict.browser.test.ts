import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from '../helpers/browser';
import { openHydrated } from '../browser/calculators-helpers';
import { startJobsApp } from './app-fixture';
import type { JobsApp } from './app-fixture';

// Ports 17320 (app), 27320 and 29320 (its fakes).
let t: JobsApp;
let browser: Browser;
const JOB = '/app/jobs/job_demo_basement';

beforeAll(async () => {
  t = await startJobsApp(17320);
  browser = await launchBrowser();
}, 120_000);
afterAll(async () => {
  await browser?.close();
  t?.db.close();
  await t?.app.stop();
});

async function openJob(page: Page): Promise<void> {
  await openHydrated(page, JOB);
  await page.getByLabel('Notes').waitFor();
}

const saved = (): { notes: string; site_address: string; revision: number } =>
  t.db.prepare("select notes, site_address, revision from jobs where id = 'job_demo_basement'").get() as never;

describe('job page in two tabs (QA s23 H3)', () => {
  test('does refuse the stale tab, keep its typed text, and let it reload or overwrite on purpose', async () => {
    const context = await browser.newContext({ baseURL: t.app.url });
    const [name, ...value] = t.as('usr_demo_owner').cookie.split('=');
    await context.addCookies([{ name: name!, value: value.join('='), url: t.app.url }]);
    const [a, b] = [await context.newPage(), await context.newPage()];
    await openJob(a);
    await openJob(b);

    await a.getByLabel('Notes').fill('TAB A: important access note — gate code 4471');
    await a.getByRole('button', { name: 'Save changes' }).click();
    await a.getByText('Saved.').waitFor();

    await b.getByLabel('Site address').fill('12 Tab B Road');
    await b.getByRole('button', { name: 'Save changes' }).click();
    const conflict = b.getByTestId('job-conflict');
    await conflict.waitFor();
    expect(await conflict.innerText()).toMatch(/Not saved.*Notes/s);
    expect(await b.getByText('Saved.').count()).toBe(0);
    expect(await b.getByLabel('Site address').inputValue()).toBe('12 Tab B Road');
    expect(saved()).toMatchObject({ notes: 'TAB A: important access note — gate code 4471', revision: 2 });

    await b.getByRole('button', { name: 'Save mine over it' }).click();
    await b.getByText('Saved.').waitFor();
    expect(saved()).toMatchObject({ site_address: '12 Tab B Road', revision: 3 });

    // Tab A is stale now; it takes the saved job instead.
    await a.getByLabel('Client').fill('Typed in A');
    await a.getByRole('button', { name: 'Save changes' }).click();
    await a.getByTestId('job-conflict').waitFor();
    await a.getByRole('button', { name: 'Load the saved job (drop my changes)' }).click();
    await a.getByTestId('job-conflict').waitFor({ state: 'detached' });
    expect(await a.getByLabel('Site address').inputValue()).toBe('12 Tab B Road');
    expect(saved().revision).toBe(3);
    await context.close();
  }, 60_000);
});
