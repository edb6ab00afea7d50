import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser } from 'playwright-core';
import path from 'node:path';
import { launchBrowser, phoneContext, tempDir } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import { formatQuantity, solveSiphon } from '../../src/lib/hydraulics';
import { quickSiphonRequest, QUICK_DEFAULTS } from '../../src/lib/calculators/quick-check';
import { calculatorReady, figure, leadingNumber, openHydrated, sidewaysOverflow, watchErrors } from './calculators-helpers';

let app: StartedApp;
let browser: Browser;

beforeAll(async () => {
  [app, browser] = await Promise.all([startApp(16201), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const G = 9.80665;

describe('quick check on a phone', () => {
  for (const [mode, word] of [
    ['siphon', 'Will run'],
    ['line', 'Will flow'],
    ['tank', 'Empties'],
  ] as const) {
    test(`does the ${mode} choice from the landing page to a verdict, cautions beside it`, async () => {
      const page = await (await phoneContext(browser, app.url)).newPage();
      const errors = watchErrors(page);
      await openHydrated(page, '/');
      await page.locator(`[data-start="${mode}"]`).click();
      await page.waitForURL(/\/check/);
      await calculatorReady(page);
      await expect(page.getByTestId('verdict-word').textContent()).resolves.toBe(word);
      expect(await page.locator('[data-verdict]').getAttribute('data-verdict')).toBe('runs');
      expect(await figure(page, 'flow')).toMatch(/L\/s$/);
      expect(await figure(page, 'time')).toMatch(/h:min$|s$/);
      const cautions = await page.locator('[data-caution]').evaluateAll((els) => els.map((e) => e.getAttribute('data-caution')));
      expect(cautions).toContain('estimates');
      if (mode === 'siphon') expect(cautions).toContain('no-mouth-priming');
      // Product brief: contaminated water and edges apply to every job, not only to one mode.
      expect(cautions).toContain('contaminated-water');
      expect(cautions).toContain('edges-and-confined-spaces');
      expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
      const small = await page.locator('button, input:not(.sr-only), select, label:has(input.sr-only)').evaluateAll((els) =>
        els.filter((e) => e.getBoundingClientRect().height > 0 && e.getBoundingClientRect().height < 44).length,
      );
      expect(small).toBe(0);
      expect(errors).toEqual([]);
    });
  }

  test('does show the same siphon figures as the engine for the same inputs', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(page, '/check?mode=siphon&crest_m=3&length_m=25');
    const s = { ...QUICK_DEFAULTS, crest_m: 3, length_m: 25 };
    const r = solveSiphon(quickSiphonRequest(s, 0.0254, 'suction-hose-smooth'));
    expect(await figure(page, 'flow')).toBe(formatQuantity('flow', r.flow_m3_s, 'metric'));
    expect(await figure(page, 'crest-pressure')).toBe(formatQuantity('pressure', r.crest_pressure_abs_pa, 'metric'));
  });

  test('does drain a box tank through a hole in the Torricelli closed-form time', async () => {
    // Box of plan area A through a sharp hole a (Cd 0.61) from depth h0 to empty:
    // t = (A / (Cd·a))·√(2·h0/g) — Torricelli's law integrated over the falling head
    // (any fluid-mechanics text, e.g. White, Fluid Mechanics, tank-draining example).
    const page = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(page, '/check?mode=tank&tank_outlet=hole');
    const A = 2 * 1.5;
    const a = (Math.PI * 0.025 ** 2) / 4;
    const t = (A / (0.61 * a)) * Math.sqrt((2 * 1.2) / G);
    const [h, m] = (await figure(page, 'time')).split(' ')[0]!.split(':').map(Number);
    expect(Math.abs(h! * 60 + m! - t / 60)).toBeLessThanOrEqual(0.5 + 1e-9); // shown to the nearest minute
  });

  test('does switch units by the exact NIST factors and remember the choice', async () => {
    const ctx = await phoneContext(browser, app.url);
    const page = await ctx.newPage();
    await openHydrated(page, '/check?mode=siphon');
    const length = page.locator('input[name="length_m"]');
    expect(await length.inputValue()).toBe('15');
    const litres = leadingNumber(await figure(page, 'flow'));
    await page.getByRole('button', { name: 'US units' }).click();
    // NIST SP 811 App. B: 1 ft = 0.3048 m exactly; 1 US gal = 3.785 411 784 L exactly.
    expect(Number(await length.inputValue())).toBeCloseTo(15 / 0.3048, 3);
    expect(await figure(page, 'flow')).toMatch(/US gal\/min$/);
    const gpm = leadingNumber(await figure(page, 'flow'));
    expect(gpm / litres).toBeCloseTo(60 / 3.785411784, 1); // both shown to 3 significant figures
    await page.reload();
    await calculatorReady(page);
    expect(await page.getByRole('button', { name: 'US units' }).getAttribute('aria-pressed')).toBe('true');
  });

  test('does offer sign-in, not a form that fails, when a signed-out crew taps Save to a job', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(page, '/check');
    await calculatorReady(page);
    const before = await figure(page, 'flow');
    await page.getByRole('button', { name: 'Save to a job' }).click();
    const prompt = page.locator('[data-save-blocked="signed-out"]');
    await prompt.waitFor();
    expect(await page.locator('form[aria-label="Save to a job"]').count()).toBe(0);
    const href = await prompt.getByRole('link', { name: 'Sign in' }).getAttribute('href');
    expect(href).toMatch(/^\/signin\?next=%2Fcheck/);
    expect(await figure(page, 'flow')).toBe(before);
  });

  test('does look right at 360 px (screenshot kept for review)', async () => {
    const page = await (await phoneContext(browser, app.url)).newPage();
    await openHydrated(page, '/check');
    const file = path.join(tempDir('dw-quick-'), 'quick-check-360.png');
    await page.screenshot({ path: file, fullPage: true });
    expect(await sidewaysOverflow(page)).toBeLessThanOrEqual(0);
  });
});
