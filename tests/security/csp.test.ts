/**
 * Content-Security-Policy in a real browser (Debian chromium) against the built app: every page
 * hydrates with no CSP violation and no console error, the policy is hash-based (no
 * 'unsafe-inline' for scripts or styles) and the same for prerendered and server pages, and an
 * injected inline handler is really blocked (so the "no violations" checks can fail).
 */
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { OWNER, SUPPORT, hydrated, signIn, startSecApp, watchPage } from './helpers';
import type { SecApp } from './helpers';

const PORT = 19510;
let sec: SecApp;
let browser: Browser;

beforeAll(async () => {
  [sec, browser] = await Promise.all([startSecApp(PORT), launchBrowser()]);
}, 180_000);
afterAll(async () => {
  await browser?.close();
  await sec?.stop();
});

const PUBLIC = [
  '/',
  '/check',
  '/siphon',
  '/gravity-line',
  '/drain',
  '/guides',
  '/pricing',
  '/cautions',
  '/developers/api',
  '/signin',
];
const OWNER_PAGES = [
  '/app',
  '/app/jobs',
  '/app/jobs/job_demo_koi',
  '/app/jobs/job_demo_koi/report',
  '/app/team',
  '/app/brand',
  '/app/billing',
  '/app/account',
  '/app/flags',
];
const DESK_PAGES = ['/support', '/support/flags/flg_demo_tank_wall'];

/** script-src and style-src of a policy. */
function sources(csp: string, name: string): string[] {
  const d = csp
    .split(';')
    .map((s) => s.trim())
    .find((s) => s.startsWith(`${name} `));
  return d ? d.split(/\s+/).slice(1) : [];
}

async function cspOf(path: string, cookie?: string): Promise<string> {
  const r = await fetch(`${sec.app.url}${path}`, { headers: cookie ? { cookie } : {} });
  expect(r.status, path).toBe(200);
  const all = r.headers.get('content-security-policy') ?? '';
  expect(all, `${path} sends one policy`).not.toContain(', default-src');
  return all;
}

describe('Content-Security-Policy header', () => {
  test('does send a hash-based script-src and style-src with no unsafe-inline, same on prerendered and server pages', async () => {
    const cookie = `authjs.session-token=${sec.session(OWNER)}`;
    const prerendered = await cspOf('/check');
    const server = await cspOf('/app/jobs', cookie);
    const api = (await fetch(`${sec.app.url}/api/health`)).headers.get('content-security-policy');
    for (const csp of [prerendered, server]) {
      for (const name of ['script-src', 'style-src']) {
        expect(sources(csp, name)).not.toContain("'unsafe-inline'");
        expect(sources(csp, name)).toContain("'self'");
        expect(sources(csp, name).some((s) => /^'sha256-[A-Za-z0-9+/]+=*'$/.test(s))).toBe(true);
      }
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("object-src 'none'");
    }
    expect(server).toBe(prerendered);
    expect(api).toBe(prerendered);
  });
});

describe('pages under the policy', () => {
  const visit = async (who: string | null, paths: string[]): Promise<void> => {
    const context = await phoneContext(browser, sec.app.url);
    if (who) await signIn(context, sec, who);
    for (const path of paths) {
      const page = await context.newPage();
      const watch = await watchPage(page);
      const res = await page.goto(path);
      expect(res?.status(), path).toBe(200);
      await hydrated(page);
      await page.waitForLoadState('networkidle');
      expect(await watch.violations(), path).toEqual([]);
      expect(watch.errors, path).toEqual([]);
      expect(watch.failed, path).toEqual([]);
      await page.close();
    }
    await context.close();
  };

  test('does hydrate every public page with no CSP violation', () => visit(null, PUBLIC), 120_000);
  test(
    'does hydrate every owner page, the print report included, with no CSP violation',
    () => visit(OWNER, OWNER_PAGES),
    120_000,
  );
  test(
    'does hydrate the support desk with no CSP violation',
    () => visit(SUPPORT, DESK_PAGES),
    60_000,
  );

  test('does draw chart.js charts and register the service worker under the policy', async () => {
    const context = await phoneContext(browser, sec.app.url);
    const page = await context.newPage();
    const watch = await watchPage(page);
    await page.goto('/siphon');
    await hydrated(page);
    await page.getByRole('button', { name: 'Show chart' }).first().click();
    await page.locator('canvas').first().waitFor();
    await page.goto('/check');
    await hydrated(page);
    await page.waitForFunction(
      async () => Boolean(await navigator.serviceWorker.getRegistration()),
      null,
      { timeout: 15_000 },
    );
    expect(await watch.violations()).toEqual([]);
    expect(watch.errors).toEqual([]);
    await context.close();
  }, 60_000);

  test('does style the print report with its brand colours (the per-request style hash)', async () => {
    const context = await phoneContext(browser, sec.app.url);
    await signIn(context, sec, OWNER);
    const brand = {
      companyName: 'Heronsgate Drainage',
      primaryColour: '#7a1f5c',
      accentColour: '#1b7f86',
    };
    const put = await fetch(`${sec.app.url}/api/brand`, {
      method: 'PUT',
      headers: sec.as(OWNER),
      body: JSON.stringify(brand),
    });
    expect(put.status).toBe(200);
    const expected = brand.primaryColour;
    const page = await context.newPage();
    await page.goto('/app/jobs/job_demo_koi/report');
    const hex = (rgb: string): string =>
      '#' +
      (rgb.match(/\d+/g) ?? [])
        .slice(0, 3)
        .map((n) => Number(n).toString(16).padStart(2, '0'))
        .join('');
    expect(
      hex(await page.evaluate(() => getComputedStyle(document.querySelector('h1')!).color)),
    ).toBe(expected);
    await context.close();
  });

  test('does block an injected inline event handler and inline script (the policy is enforced)', async () => {
    const context = await phoneContext(browser, sec.app.url);
    const page = await context.newPage();
    const watch = await watchPage(page);
    await page.goto('/check');
    await hydrated(page);
    const ran = await page.evaluate(async () => {
      const w = window as unknown as { __ran?: number };
      document.body.insertAdjacentHTML(
        'beforeend',
        '<img src="/nope.png" onerror="window.__ran = 1">',
      );
      const s = document.createElement('script');
      s.textContent = 'window.__ran = 2';
      document.body.append(s);
      await new Promise((r) => setTimeout(r, 500));
      return w.__ran ?? 0;
    });
    expect(ran).toBe(0);
    expect((await watch.violations()).length).toBeGreaterThanOrEqual(2);
    await context.close();
  });
});
