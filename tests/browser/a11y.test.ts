import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser } from 'playwright-core';
import { seriousViolations } from '../helpers/axe';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

// Ports 16500–16549 belong to the offline, accessibility and page-budget checks.
let app: StartedApp;
let browser: Browser;

beforeAll(async () => {
  [app, browser] = await Promise.all([startApp(16501), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

// axe-core (Deque's open rules for WCAG 2.x) is the outside reference; serious and critical only.
const PAGES = ['/', '/guides', '/guides/priming-a-siphon', '/guides/why-siphons-break', '/pricing'];

describe('accessibility of the static pages', () => {
  for (const path of PAGES) {
    test(`does have no serious or critical axe findings on ${path}`, async () => {
      const context = await phoneContext(browser, app.url);
      const page = await context.newPage();
      const response = await page.goto(path);
      expect(response?.status()).toBe(200);
      expect(await seriousViolations(page)).toEqual([]);
      await context.close();
    });
  }

  test('does report a known serious fault (the check itself can fail)', async () => {
    const page = await browser.newPage();
    await page.setContent(
      '<html lang="en"><title>t</title><main><img src="data:,"><input></main></html>',
    );
    const ids = (await seriousViolations(page)).map((v) => v.id);
    expect(ids).toEqual(expect.arrayContaining(['image-alt', 'label']));
    await page.close();
  });
});
