import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startJobsApp } from '../jobs/app-fixture';
import type { JobsApp } from '../jobs/app-fixture';
import { openHydrated } from '../browser/calculators-helpers';
import { UNIT_STORAGE_KEY } from '../../src/lib/stores/unit-system';

let t: JobsApp;
let browser: Browser;
const CREW = 'usr_demo_crew1';

beforeAll(async () => {
  [t, browser] = await Promise.all([startJobsApp(16799), launchBrowser()]);
}, 120_000);
afterAll(async () => {
  await browser?.close();
  t?.db.close();
  await t?.app.stop();
});

const put = (
  body: unknown,
  headers: Record<string, string> = {},
  type = 'application/json',
): Promise<Response> =>
  fetch(`${t.app.url}/api/account/units`, {
    method: 'PUT',
    headers: { 'content-type': type, origin: t.app.url, ...headers },
    body: typeof body === 'string' ? body : JSON.stringify(body),
  });

const stored = (userId: string): string | null =>
  (
    t.db.prepare('select unit_system from users where id = ?').get(userId) as {
      unit_system: string | null;
    }
  ).unit_system;

describe('PUT /api/account/units', () => {
  test('does remember the choice on the signed-in account', async () => {
    const r = await put({ unit_system: 'us' }, t.as(CREW));
    expect(r.status).toBe(200);
    expect(await r.json()).toEqual({ saved: true, unit_system: 'us' });
    expect(stored(CREW)).toBe('us');
  });

  test('does answer a signed-out switch without storing anything', async () => {
    const r = await put({ unit_system: 'metric' });
    expect(await r.json()).toEqual({ saved: false, unit_system: 'metric' });
  });

  test('does refuse bad bodies with the field named, never a 500', async () => {
    const wrong = await put({ unit_system: 'imperial' }, t.as(CREW));
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).issues[0].path).toBe('unit_system');
    expect((await put({ unit_system: 'us', extra: 1 }, t.as(CREW))).status).toBe(400);
    expect((await put('{"unit_system":', t.as(CREW))).status).toBe(400);
    expect(
      (await put('unit_system=us', t.as(CREW), 'application/x-www-form-urlencoded')).status,
    ).toBe(415);
    const cross = await put(
      { unit_system: 'metric' },
      { ...t.as(CREW), origin: 'https://elsewhere.example' },
    );
    expect(cross.status).toBe(403);
    expect(stored(CREW)).toBe('us');
  });
});

describe('units across devices', () => {
  test("does start a signed-in person's second device on the units they picked on the first", async () => {
    const cookie = t.as('usr_demo_owner').cookie.split('=');
    const signedIn = async (): Promise<ReturnType<typeof phoneContext>> => {
      const context = await phoneContext(browser, t.app.url);
      await context.addCookies([{ name: cookie[0]!, value: cookie[1]!, url: t.app.url }]);
      return context;
    };
    // Phone: the calculator page is prerendered and does not know who is signed in.
    const phone = await (await signedIn()).newPage();
    await openHydrated(phone, '/siphon');
    await phone.getByRole('button', { name: 'US units' }).click();
    await expect.poll(() => stored('usr_demo_owner')).toBe('us');
    // Laptop with a metric browser: the first signed-in page carries the account's choice.
    const laptop = await (await signedIn()).newPage();
    await laptop.goto('/app');
    await openHydrated(laptop, '/siphon');
    expect(
      await laptop.getByRole('button', { name: 'US units' }).getAttribute('aria-pressed'),
    ).toBe('true');
    expect(await laptop.locator('input[name="crest_m"]').inputValue()).toBe('6');
  });

  test('does save the units picked on the account page, and a US browser then starts in metric', async () => {
    const cookie = t.as('usr_demo_crew2').cookie.split('=');
    const context = await phoneContext(browser, t.app.url, 'en-US');
    await context.addCookies([{ name: cookie[0]!, value: cookie[1]!, url: t.app.url }]);
    const page = await context.newPage();
    await page.goto('/app/account');
    await page.getByRole('radio', { name: /^Metric/ }).check();
    await page.getByRole('button', { name: 'Save units' }).click();
    await page.getByRole('status').waitFor();
    expect(stored('usr_demo_crew2')).toBe('metric');
    // the notice can show before the page's module script has copied the choice to this browser
    await expect
      .poll(() => page.evaluate((key) => localStorage.getItem(key), UNIT_STORAGE_KEY))
      .toBe('metric');
    await openHydrated(page, '/siphon');
    expect(await page.getByRole('button', { name: 'Metric' }).getAttribute('aria-pressed')).toBe(
      'true',
    );
    expect(await page.locator('input[name="crest_m"]').inputValue()).toBe('1.8');
    // a forged form value is refused with a message, and the saved choice stays
    const forged = await fetch(`${t.app.url}/app/account`, {
      method: 'POST',
      headers: { ...t.as('usr_demo_crew2'), 'content-type': 'application/x-www-form-urlencoded' },
      body: 'action=units&unit_system=imperial',
    });
    expect(forged.status).toBe(400);
    expect(await forged.text()).toContain('Pick metric or US customary units.');
    expect(stored('usr_demo_crew2')).toBe('metric');
  });
});
