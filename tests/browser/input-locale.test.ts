import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import { figure, openHydrated, watchErrors } from './calculators-helpers';

let app: StartedApp;
let browser: Browser;

beforeAll(async () => {
  [app, browser] = await Promise.all([startApp(17137), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const usPage = async (): Promise<Page> => (await phoneContext(browser, app.url, 'en-US')).newPage();

/** The message under a number box, by the box's name. */
const boxMessage = async (page: Page, name: string): Promise<string> => {
  const id = await page.locator(`input[name="${name}"]`).getAttribute('id');
  return (await page.locator(`[id="${id}-hint"]`).textContent()) ?? '';
};

const US_GAL_M3 = 3.785411784e-3; // NIST SP 811, exact

describe('number boxes in en-US', () => {
  // CLDR (via Intl): in en-US a comma groups thousands, so 1,500 is fifteen hundred.
  test('does read 1,500 US gal on /check as fifteen hundred gallons', async () => {
    const page = await usPage();
    const errors = watchErrors(page);
    await openHydrated(page, '/check');
    const box = page.locator('input[name="volume_m3"]');
    // the US start is 1 500 US gal, so 1,500 must give the starting time again
    expect(await box.inputValue()).toBe('1500');
    const plain = await figure(page, 'time');
    await box.fill('10');
    await expect.poll(() => figure(page, 'time')).not.toBe(plain);
    await box.fill('1,500');
    await expect.poll(() => figure(page, 'time')).toBe(plain);
    const stored = new URL(page.url()).searchParams.get('volume_m3');
    if (stored !== null) expect(Number(stored)).toBeCloseTo(1500 * US_GAL_M3, 5);
    expect(await box.getAttribute('aria-invalid')).toBeNull();
    await box.fill('1,5');
    expect(await box.getAttribute('aria-invalid')).toBe('true');
    expect(await boxMessage(page, 'volume_m3')).toMatch(/^Use a point for decimals/);
    expect(errors).toEqual([]);
  });

  // Source: NIST SP 811 — 32 °F is 0 °C; 1 ft = 0.3048 m, so 100 000 m = 328 084 ft (rounded).
  test('does accept 32 °F and call 1e9 ft of line out of range in feet', async () => {
    const page = await usPage();
    await openHydrated(page, '/siphon');
    await page.locator('input[name="temp_c"]').fill('32');
    expect(await page.locator('input[name="temp_c"]').getAttribute('aria-invalid')).toBeNull();
    await expect.poll(() => new URL(page.url()).searchParams.get('temp_c')).toBe('0');
    await expect(page.getByTestId('verdict-word').count()).resolves.toBe(1);
    await page.locator('input[name="length_m"]').fill('1e9');
    expect(await boxMessage(page, 'length_m')).toBe('Out of range: use 0 to 328084 ft');
  });
});

describe('depth–area table on /drain in en-US', () => {
  test('does give a result as soon as the table shape is chosen', async () => {
    const page = await usPage();
    await openHydrated(page, '/drain');
    await page.locator('select[name="shape"]').selectOption('stage_table');
    await page.getByTestId('stage-count').waitFor();
    await expect(page.getByTestId('verdict-word').count()).resolves.toBe(1);
  });

  // A spreadsheet's export with quoted, grouped numbers. Expected: 2 ft × mean(1000, 1500) ft²
  // = 2500 ft³ = 18 700 US gal (1 ft³ = 7.48052 US gal, NIST SP 811), to 3 figures.
  test('does read quoted thousands, and keeps the table when a binary file is uploaded', async () => {
    const page = await usPage();
    const errors = watchErrors(page);
    await openHydrated(page, '/drain?shape=stage_table&outlet=orifice');
    const upload = page.getByTestId('stage-upload');
    const csv = 'depth (ft),area (ft²)\n0,"1,000"\n2,"1,500"\n4,"2,000"\n';
    await upload.setInputFiles({
      name: 'stage.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(csv),
    });
    await page.getByRole('alert').filter({ hasText: 'the table’s top depth, 4.00 ft' }).waitFor();
    await page.locator('input[name="initial_depth_m"]').fill('2');
    await expect.poll(() => figure(page, 'volume')).toBe('18\u202f700 US gal');
    const typed = await page.locator('textarea[name="stage"]').inputValue();
    const junk = Buffer.from(Array.from({ length: 300_000 }, (_, i) => (i * 7919 + 13) % 256));
    await upload.setInputFiles({
      name: 'photo.bin',
      mimeType: 'application/octet-stream',
      buffer: junk,
    });
    await page.getByTestId('stage-errors').waitFor();
    expect(await page.getByTestId('stage-errors').locator('li').count()).toBe(1);
    expect(await page.getByTestId('stage-errors').textContent()).toMatch(
      /not a CSV text file.*unchanged/,
    );
    expect(await page.locator('textarea[name="stage"]').inputValue()).toBe(typed);
    expect(await figure(page, 'volume')).toBe('18\u202f700 US gal');
    expect(errors).toEqual([]);
  });
});
