import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import { figure, openHydrated } from './calculators-helpers';

let app: StartedApp;
let browser: Browser;
const contexts: BrowserContext[] = [];

beforeAll(async () => {
  [app, browser] = await Promise.all([startApp(16203), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** A page in a new phone context; en-US reads US customary, the default en-GB metric. */
async function visitor(path: string, locale?: string): Promise<Page> {
  const context = await phoneContext(browser, app.url, locale);
  contexts.push(context);
  const page = await context.newPage();
  await openHydrated(page, path);
  return page;
}

const input = (page: Page, name: string): Promise<string> =>
  page.locator(`input[name="${name}"]`).first().inputValue();

const shareHref = async (page: Page): Promise<string> =>
  (await page.getByTestId('share-link').getAttribute('href')) ?? '';

describe("starting values in the crew's own units", () => {
  // A first visit from a US browser hydrates in metric (as prerendered), then switches part by
  // part (src/lib/stores/use-staged-units.ts) and starts on round US values.
  for (const [route, depth, usDepth, metricDepth, table] of [
    ['/siphon', 'crest_m', '6', '1.8', 'loss-table'],
    ['/drain', 'initial_depth_m', '5', '1.5', 'drawdown-table'],
  ]) {
    test(`does start ${route} on round US figures for a US browser, metric ones elsewhere`, async () => {
      const [metric, us] = [await visitor(route), await visitor(route, 'en-US')];
      expect(await input(us, depth)).toBe(usDepth);
      expect(await input(us, 'temp_c')).toBe('60');
      expect(await input(metric, depth)).toBe(metricDepth);
      expect(await input(metric, 'temp_c')).toBe('15');
      expect(await figure(us, 'flow')).toMatch(/US gal\/min$/);
      expect(await us.getByTestId(table).textContent()).toContain(' ft');
      expect(await metric.getByTestId(table).textContent()).not.toContain(' ft');
    });
  }

  test('does start the quick check on 50 ft of hose and 1 500 US gal for a US browser', async () => {
    const us = await visitor('/check', 'en-US');
    expect(await input(us, 'length_m')).toBe('50');
    expect(await input(us, 'volume_m3')).toBe('1500');
    expect(new URL(us.url()).searchParams.get('start')).toBe('us');
  });

  test("does open a US visitor's unchanged siphon link on the same inputs in metric", async () => {
    const us = await visitor('/siphon', 'en-US');
    const href = await shareHref(us);
    expect(href).toContain('start=us');
    const metric = await visitor(href);
    // NIST SP 811 App. B: 1 ft = 0.3048 m exactly, so 6 ft shows as 1.8288 m
    expect(await input(metric, 'crest_m')).toBe('1.8288');
    const again = await visitor(href, 'en-US');
    expect(await figure(again, 'flow')).toBe(await figure(us, 'flow'));
  });

  test('does open an unchanged metric link on the metric inputs for a US visitor', async () => {
    const metric = await visitor('/siphon');
    const href = await shareHref(metric);
    expect(href).toContain('start=metric');
    const us = await visitor(href, 'en-US');
    // 1.8 m / 0.3048 m/ft = 5.90551 ft to the field's 6 figures
    expect(await input(us, 'crest_m')).toBe('5.90551');
    const back = await visitor(href);
    expect(await figure(back, 'flow')).toBe(await figure(metric, 'flow'));
  });
});
