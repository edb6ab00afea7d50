import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import { formatQuantity } from '../../src/lib/hydraulics';
import { figure, openHydrated, sidewaysOverflow, watchErrors } from './calculators-helpers';

let app: StartedApp;
let browser: Browser;

beforeAll(async () => {
  [app, browser] = await Promise.all([startApp(16202), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('full calculator tools on a phone', () => {
  for (const route of ['/siphon', '/gravity-line', '/drain']) {
    test(`does render ${route} with a verdict, no console errors, no sideways scroll, no chart code up front`, async () => {
      const page = await (await phoneContext(browser, app.url)).newPage();
      const errors = watchErrors(page);
      const scripts: string[] = [];
      page.on('request', (r) => r.resourceType() === 'script' && scripts.push(r.url()));
      await openHydrated(page, route);
      await expect(page.getByTestId('verdict-word').count()).resolves.toBe(1);
      expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
      const before = scripts.length;
      expect(scripts.some((u) => /chart/i.test(u))).toBe(false);
      await page.getByRole('button', { name: 'Show chart' }).first().click();
      await page.locator('canvas').first().waitFor();
      expect(scripts.length).toBeGreaterThan(before);
      expect(errors).toEqual([]);
    });
  }

  test('does reproduce a siphon result from its share link', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(page, '/siphon');
    await page.locator('input[name="crest_m"]').fill('2.4');
    await page.locator('input[name="length_m"]').fill('32');
    await page.getByRole('button', { name: 'Add a fitting' }).click();
    const flow = await figure(page, 'flow');
    const crest = await figure(page, 'crest-pressure');
    const href = await page.getByTestId('share-link').getAttribute('href');
    expect(href).toContain('crest_m=2.4');
    const other = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(other, href!);
    expect(await other.locator('input[name="crest_m"]').inputValue()).toBe('2.4');
    expect(await other.locator('[data-fitting-row]').count()).toBe(1);
    expect(await figure(other, 'flow')).toBe(flow);
    expect(await figure(other, 'crest-pressure')).toBe(crest);
  });

  test('does show the same gravity-line flow as POST /api/v1/line for the same inputs', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(
      page,
      '/gravity-line?source_level_m=4&length_m=50&size=layflat-hose-3in&temp_c=8',
    );
    const res = await fetch(`${app.url}/api/v1/line`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: app.url },
      body: JSON.stringify({
        fluid: { water_temperature_c: 8 },
        site: { altitude_m: 0 },
        line: {
          inner_diameter_m: 0.0762,
          length_m: 50,
          material: 'layflat-hose',
          entrance_k: 1,
          fittings: [],
          parallel_lines: 1,
        },
        source_level_m: 4,
        outlet_elevation_m: 0,
      }),
    });
    expect(res.status).toBe(200);
    const api = (await res.json()) as { flow_m3_s: number; velocity_m_s: number };
    expect(await figure(page, 'flow')).toBe(formatQuantity('flow', api.flow_m3_s, 'metric'));
    expect(await figure(page, 'velocity')).toBe(
      formatQuantity('velocity', api.velocity_m_s, 'metric'),
    );
  });

  test('does work out what would help on the drain-down in a web worker, live as inputs change', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    const errors = watchErrors(page);
    const workers: string[] = [];
    page.on('worker', (w) => workers.push(w.url()));
    await openHydrated(page, '/drain?outlet=orifice&target_time_s=60');
    const hints = page.getByTestId('hints');
    // a one-minute target is far too short for the default basin: the hint says how much more
    await expect
      .poll(() => hints.textContent(), { timeout: 10_000 })
      .toMatch(/More time: it needs .+ more than you have\./);
    // record the section's busy flag: the old hints are marked as updating until the reply
    const section = page.getByRole('region', { name: 'What would help' });
    await section.evaluate((el) => {
      const seen: (string | null)[] = [];
      (window as unknown as { __busy: typeof seen }).__busy = seen;
      new MutationObserver(() => seen.push(el.getAttribute('aria-busy'))).observe(el, {
        attributes: true,
        attributeFilter: ['aria-busy'],
      });
    });
    // a target far beyond the drain-down's time: the next reply says there is time to spare
    await page.locator('input[name="target_time_s"]').fill('100000');
    await expect
      .poll(() => hints.textContent(), { timeout: 10_000 })
      .toMatch(/It makes your time with .+ to spare\./);
    await expect.poll(() => section.getAttribute('aria-busy')).toBe('false');
    const busy = await page.evaluate(() => (window as unknown as { __busy: string[] }).__busy);
    expect(busy).toContain('true');
    // the solvers ran off the main thread (a failed worker would fall back silently)
    expect(workers.filter((url) => /drain-hints\.worker/.test(url))).toHaveLength(1);
    expect(errors).toEqual([]);
  });

  test('does still show the drain-down hints when the worker script cannot load', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    // as when a page cached offline asks for a worker script it never fetched; late, so the
    // jobs already sent to the worker are the ones that must be worked out again
    await page.route(/drain-hints\.worker/, (route) => setTimeout(() => void route.abort(), 1500));
    await openHydrated(page, '/drain?outlet=orifice&target_time_s=60');
    await expect
      .poll(() => page.getByTestId('hints').textContent(), { timeout: 10_000 })
      .toMatch(/More time: it needs .+ more than you have\./);
  });

  test('does take a good depth–area CSV upload and name the row of a malformed one', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    const errors = watchErrors(page);
    await openHydrated(page, '/drain?shape=stage_table&initial_depth_m=1.2&outlet=orifice');
    const upload = page.getByTestId('stage-upload');
    const good = 'depth (m),area (m2)\n0,10\n0.4,14\n0.8,19\n1.2,25\n';
    await upload.setInputFiles({
      name: 'pond.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(good),
    });
    // the file is read asynchronously: wait for the table to take it
    await page.waitForFunction(() =>
      document.querySelector('[data-testid="stage-count"]')?.textContent?.includes('4 levels'),
    );
    // Volume of a table with area linear in depth: trapezoid rule is exact, Σ (A1 + A2)/2·Δh
    // = 0.4·(12 + 16.5 + 22) = 20.2 m³ = 20 200 L.
    expect(await figure(page, 'volume')).toBe('20\u202f200 L');
    const bad = 'depth,area\n0,10\n0.4,abc\n0.8,19\n';
    await upload.setInputFiles({ name: 'bad.csv', mimeType: 'text/csv', buffer: Buffer.from(bad) });
    const msg = await page.getByTestId('stage-errors').textContent();
    expect(msg).toContain('Row 3');
    expect(msg).toContain('abc');
    expect(errors).toEqual([]);
  });
});
