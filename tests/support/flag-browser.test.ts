import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser } from 'playwright-core';
import type { Db } from '../../src/lib/db/client';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { openHydrated } from '../browser/calculators-helpers';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import {
  assertPortFree,
  appDb,
  prepareDesk,
  sessionCookie,
  threadLink,
  waitForEmail,
} from './helpers';

// A crew member on a phone flags a quick-check result signed out; support answers from the desk
// (also on a phone); the reporter's e-mail arrives in the fake inbox and its link shows the reply.
const PORT = 16610;
const FAKE = `http://127.0.0.1:${PORT + 10_000}`;
const REPORTER = 'pond.crew@example.org';
const REPLY =
  'The crest is close to its limit at that height; lower the hose over the wall by 30 cm.';

let app: StartedApp;
let db: Db;
let browser: Browser;

beforeAll(async () => {
  await assertPortFree(PORT);
  app = await startApp(PORT, { FLAGS_PER_WINDOW: '1000' });
  db = appDb(app.dataDir);
  prepareDesk(db);
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  db?.$client.close();
  await app?.stop();
});

describe('flagging from the quick check', () => {
  test('does reach support signed out, and the reply reaches the reporter by e-mail', async () => {
    const crew = await phoneContext(browser, app.url);
    const page = await crew.newPage();
    await openHydrated(page, '/check');
    await page.getByRole('button', { name: 'Flag this result' }).click();
    await page.getByLabel('This looks wrong').check();
    await page.getByLabel('Tell us more (optional)').fill('Hose ran slower than this says.');
    await page.getByLabel('Your e-mail, so we can answer').fill(REPORTER);
    await page.getByRole('button', { name: 'Send to support' }).click();
    await page.getByTestId('flag-sent').waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(
      360,
    );
    const received = await waitForEmail(
      FAKE,
      REPORTER,
      (e) => e.subject === 'We have your flagged result',
    );

    const desk = await phoneContext(browser, app.url);
    const [name, value] = sessionCookie(db, 'usr_demo_support').split('=');
    await desk.addCookies([{ name, value, url: app.url }]);
    const deskPage = await desk.newPage();
    await deskPage.goto('/support');
    const row = deskPage.getByTestId('queue').locator('tr', { hasText: REPORTER });
    await row.getByRole('link').click();
    await deskPage.getByText('Hose ran slower than this says.').waitFor();
    await deskPage.getByRole('button', { name: "Re-run on today's engine" }).click();
    await deskPage.getByTestId('rerun-summary').waitFor();
    expect(await deskPage.getByTestId('rerun-summary').textContent()).toContain(
      'every field matches',
    );
    await deskPage.getByLabel('Reply to the reporter (sent by e-mail)').fill(REPLY);
    await deskPage.getByRole('button', { name: 'Send reply' }).click();
    await deskPage.getByTestId('thread').getByText(REPLY).waitFor();

    const mail = await waitForEmail(
      FAKE,
      REPORTER,
      (e) => e.subject === 'Reply about your flagged result',
    );
    expect(mail.text).toContain(REPLY);

    await page.goto(threadLink(received));
    await page.getByTestId('thread').getByText(REPLY).waitFor();
    expect(await page.getByTestId('flag-status').textContent()).toContain('Answered');
    await crew.close();
    await desk.close();
  }, 90_000);

  test('does confirm the account address to a signed-in reporter, whatever was typed', async () => {
    const crew = await phoneContext(browser, app.url);
    const [name, value] = sessionCookie(db, 'usr_demo_crew1').split('=');
    await crew.addCookies([{ name, value, url: app.url }]);
    const page = await crew.newPage();
    await openHydrated(page, '/check');
    await page.getByRole('button', { name: 'Flag this result' }).click();
    const typed = page.getByLabel('Your e-mail, so we can answer');
    // passes the browser's own check (no dot needed there) but not ours
    await typed.fill('crew@site');
    await page.getByRole('button', { name: 'Send to support' }).click();
    // a malformed address is named as such, not as a missing one, and no field name shows
    await expect(page.getByRole('alert').textContent()).resolves.toBe(
      'That e-mail address does not look complete; check it.',
    );
    await typed.fill('someone.else@example.org');
    await page.getByRole('button', { name: 'Send to support' }).click();
    await page.getByTestId('flag-sent').waitFor();
    const sent = await page.getByTestId('flag-sent').textContent();
    expect(sent).toContain('tomas@heronsgate.example');
    expect(sent).not.toContain('someone.else');
    await crew.close();
  }, 60_000);
});
