import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import { figure, openHydrated, watchErrors } from './calculators-helpers';

// A result must never pass for the answer to boxes that hold no accepted value: an emptied or
// out-of-range box leaves the last accepted result on screen, so it is marked as not updated.
let app: StartedApp;
let browser: Browser;

beforeAll(async () => {
  [app, browser] = await Promise.all([startApp(16207), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const notice = (page: Page) => page.getByTestId('stale-notice');

describe('a result while a box holds no accepted value', () => {
  test('does mark the siphon result as not updated until the box is fixed', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    const errors = watchErrors(page);
    await openHydrated(page, '/siphon');
    await expect(notice(page).count()).resolves.toBe(0);
    const flow = await figure(page, 'flow');
    await page.locator('input[name="crest_m"]').fill('');
    await notice(page).waitFor();
    expect(await notice(page).textContent()).toContain('1 box above is empty or not accepted');
    await expect(page.locator('[data-stale]').count()).resolves.toBe(1);
    expect(await figure(page, 'flow')).toBe(flow);
    await page.locator('input[name="length_m"]').fill('-4');
    await expect(notice(page).textContent()).resolves.toContain('2 boxes above are');
    await page.locator('input[name="crest_m"]').fill('2.4');
    await page.locator('input[name="length_m"]').fill('32');
    await notice(page).waitFor({ state: 'detached' });
    await expect(page.locator('[data-stale]').count()).resolves.toBe(0);
    expect(await figure(page, 'flow')).not.toBe(flow);
    expect(errors).toEqual([]);
  });

  test('does mark the quick check and its pinned verdict as not updated', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(page, '/check');
    await page.locator('input[name="fall_m"]').fill('');
    await notice(page).waitFor();
    // the pinned verdict shows while the result is out of view: a short phone screen
    await page.setViewportSize({ width: 390, height: 420 });
    await page.evaluate(() => window.scrollTo(0, 0));
    const dock = page.getByTestId('verdict-dock');
    await dock.waitFor();
    expect(await dock.textContent()).toContain('Not updated');
    await page.locator('input[name="fall_m"]').fill('3');
    await notice(page).waitFor({ state: 'detached' });
    expect(await dock.textContent()).not.toContain('Not updated');
  });

  test('does mark the drain-down result while the typed depth–area table does not parse', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(page, '/drain?shape=stage_table&initial_depth_m=1.2&outlet=orifice');
    const table = page.locator('textarea[name="stage"]');
    const good = await table.inputValue();
    await table.fill(`${good}\nabc`);
    await notice(page).waitFor();
    await table.fill(good);
    await notice(page).waitFor({ state: 'detached' });
  });
});
