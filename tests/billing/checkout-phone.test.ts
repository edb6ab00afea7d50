import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Db } from '../../src/lib/db/client';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import {
  ORG_ID,
  OWNER_ID,
  SESSION_COOKIE,
  appDb,
  deliveriesSettled,
  sessionFor,
  withdrawGrant,
} from './helpers';

// Ports from the billing range 16400–16499.
const APP_PORT = 16421;
const FAKE_PORT = 16431;

let app: StartedApp;
let browser: Browser;
let db: Db;

beforeAll(async () => {
  [app, browser] = await Promise.all([
    startApp(APP_PORT, {
      FAKE_STRIPE_PORT: String(FAKE_PORT),
      FAKE_RESEND_PORT: '16432',
      FAKE_STRIPE_CHAOS: '1',
      STRIPE_SECRET_KEY: '',
      STRIPE_WEBHOOK_SECRET: '',
    }),
    launchBrowser(),
  ]);
  db = appDb(app.dataDir);
  withdrawGrant(db, ORG_ID);
}, 120_000);

afterAll(async () => {
  db?.$client.close();
  await browser?.close();
  await app?.stop();
});

const noSidewaysScroll = (page: import('playwright-core').Page): Promise<number> =>
  page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

describe('owner checkout on a phone', () => {
  test('does buy the Crew plan at 360 px: declined card first, then a good one, back to a trial', async () => {
    // Signed in as the seeded owner through a session row (the cookie Auth.js uses).
    const context = await phoneContext(browser, app.url);
    await context.addCookies([
      { name: SESSION_COOKIE, value: sessionFor(db, OWNER_ID), url: app.url },
    ]);
    const page = await context.newPage();
    await page.goto('/app/billing');
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toContain(
      'Plan and billing',
    );
    expect(await page.getByTestId('seats-in-use').textContent()).toBe('3');
    expect(await noSidewaysScroll(page)).toBeLessThanOrEqual(0);

    await page.getByLabel('Seats (one per person)').fill('4');
    await page.getByLabel(/Yearly/).check();
    await page.getByRole('button', { name: 'Start 14-day trial' }).tap();
    await page.waitForURL(`http://127.0.0.1:${FAKE_PORT}/pay/**`);
    expect(await page.getByTestId('seats').textContent()).toBe('4');
    expect(await noSidewaysScroll(page)).toBeLessThanOrEqual(0);

    await page.getByLabel('Card number').fill('4000 0000 0000 0002');
    await page.getByLabel('Expiry').fill('12 / 34');
    await page.getByLabel('CVC').fill('123');
    await page.getByRole('button', { name: 'Start trial' }).tap();
    await expect(page.getByRole('alert').textContent()).resolves.toContain('declined');

    await page.getByLabel('Card number').fill('4242 4242 4242 4242');
    await page.getByLabel('CVC').fill('123');
    await page.getByRole('button', { name: 'Start trial' }).tap();
    await page.waitForURL(`${app.url}/app/billing?checkout=done**`);
    expect(await page.getByTestId('plan-status').textContent()).toBe('Trial');
    expect(await page.getByTestId('seats-paid').textContent()).toBe('4');
    expect(await page.getByTestId('plan-access').textContent()).toBe('Full');
    expect(await noSidewaysScroll(page)).toBeLessThanOrEqual(0);
    await deliveriesSettled(`http://127.0.0.1:${FAKE_PORT}`);
    await context.close();
  });
});
