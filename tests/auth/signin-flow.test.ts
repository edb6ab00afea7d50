import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { ROUTES } from '../../src/lib/auth/routes';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

// The real start command (built app, migrations, seed, fakes) and Debian chromium at 360 × 740.
const PORT = 16320;
const INBOX = 'http://127.0.0.1:16321';
let app: StartedApp;
let browser: Browser;

beforeAll(async () => {
  app = await startApp(PORT, { FAKE_RESEND_PORT: '16321' });
  browser = await launchBrowser();
}, 180_000);

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

async function latestLink(to: string): Promise<string> {
  const list = (await (await fetch(`${INBOX}/emails?to=${encodeURIComponent(to)}`, { headers: { Authorization: 'Bearer re_fake_test' } })).json()) as {
    data: { text: string }[];
  };
  return /https?:\/\/\S+/.exec(list.data[0].text)![0];
}

describe('sign-in by e-mail link', () => {
  test('does sign the owner in on a phone: request a link, open it from the fake inbox, land on /app', async () => {
    const context = await phoneContext(browser, app.url);
    const page = await context.newPage();
    await page.goto('/app/team');
    expect(new URL(page.url()).pathname).toBe('/signin');
    await page.fill('#email', 'rosa@heronsgate.example');
    await page.click('button[type=submit]');
    await page.waitForURL(/\/signin\/sent/);
    await page.goto(`${INBOX}/?to=rosa@heronsgate.example`);
    await page.click('a[href^="/m/"]');
    await page.click('a.message-link');
    await page.waitForURL(`${app.url}/app/team`);
    expect(await page.textContent('h1')).toContain('Heronsgate');
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(360);
    await context.close();
  });

  test('does give a first-time e-mail its own free workspace, owned by it', async () => {
    const email = 'new.crew@riverside.test';
    const form = new URLSearchParams({ email, next: '/app' });
    const sent = await fetch(`${app.url}/signin`, { method: 'POST', body: form, headers: { Origin: app.url }, redirect: 'manual' });
    expect(sent.status).toBe(303);
    const callback = await fetch(await latestLink(email), { redirect: 'manual' });
    const cookie = callback.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const home = await (await fetch(`${app.url}/app`, { headers: { Cookie: cookie } })).text();
    expect(home).toMatch(/data-testid="current-org"[^>]*>\s*Working in <strong[^>]*>new\.crew@riverside\.test<\/strong> as owner\s*· Field plan/);
  });

  test('does name the account link truthfully: the signed-in name on /app, "Account" on built pages', async () => {
    const email = 'header.crew@riverside.test';
    const form = new URLSearchParams({ email, next: '/app' });
    await fetch(`${app.url}/signin`, { method: 'POST', body: form, headers: { Origin: app.url }, redirect: 'manual' });
    const callback = await fetch(await latestLink(email), { redirect: 'manual' });
    const cookie = callback.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const link = (html: string): string => /data-testid="account-link"[^>]*>\s*([^<]*?)\s*</.exec(html)![1];
    expect(link(await (await fetch(`${app.url}/app`, { headers: { Cookie: cookie } })).text())).toBe(`Your account (${email})`);
    // the quick check is built ahead and served alike to the signed-in and the signed-out
    for (const headers of [{ Cookie: cookie }, {}] as Record<string, string>[]) {
      expect(link(await (await fetch(`${app.url}/check`, { headers })).text())).toBe('Account');
    }
  });

  test('does refuse a used link, signed-out API calls, crew on owner APIs and cross-site posts', async () => {
    const used = await latestLink('rosa@heronsgate.example');
    const again = await fetch(used, { redirect: 'manual' });
    expect(again.status).toBe(302);
    expect(again.headers.get('location')).toContain('error=Verification');
    expect((await fetch(`${app.url}/api/team`)).status).toBe(401);
    const form = new URLSearchParams({ email: 'tomas@heronsgate.example', next: '/app' });
    const sent = await fetch(`${app.url}/signin`, { method: 'POST', body: form, headers: { Origin: app.url }, redirect: 'manual' });
    expect(sent.status).toBe(303);
    const callback = await fetch(await latestLink('tomas@heronsgate.example'), { redirect: 'manual' });
    const cookie = callback.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    expect(cookie).toContain('authjs.session-token=');
    expect(callback.headers.getSetCookie().join(' ')).toMatch(/HttpOnly/i);
    const crew = await fetch(`${app.url}/api/team`, { headers: { Cookie: cookie } });
    expect(crew.status).toBe(403);
    expect(await crew.json()).toEqual({ error: 'forbidden' });
    expect((await fetch(`${app.url}/app`, { headers: { Cookie: cookie } })).status).toBe(200);
    const forged = await fetch(`${app.url}/api/team/invitations`, {
      method: 'POST',
      headers: { Cookie: cookie, Origin: 'https://elsewhere.example', 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'x@y.test' }),
    });
    expect(forged.status).toBe(403);
  });

  test('does refuse another organisation\'s owner on every resource-id API route (IDOR)', async () => {
    // Heronsgate's seeded ids; an unknown parameter name fails the test so new routes get a sample.
    const SAMPLES: Record<string, string> = { id: 'job_demo_koi', cid: 'calc_demo_koi', userId: 'usr_demo_crew1', sid: 'share_x' };
    const form = new URLSearchParams({ email: 'lee@pondkeeper.example', next: '/app' });
    await fetch(`${app.url}/signin`, { method: 'POST', body: form, headers: { Origin: app.url }, redirect: 'manual' });
    const callback = await fetch(await latestLink('lee@pondkeeper.example'), { redirect: 'manual' });
    const cookie = callback.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const routes = ROUTES.filter((r) => r.pattern.startsWith('/api/') && r.pattern.includes('[') && r.access !== 'anyone');
    expect(routes.length).toBeGreaterThan(3);
    for (const r of routes) {
      const url = r.pattern.replace(/\[([^\]]+)\]/g, (_m, name: string) => {
        expect(SAMPLES, `sample id for [${name}] in ${r.pattern}`).toHaveProperty(name);
        return SAMPLES[name];
      });
      for (const method of ['GET', 'PATCH', 'DELETE']) {
        const res = await fetch(`${app.url}${url}`, {
          method,
          headers: { Cookie: cookie, Origin: app.url, 'Content-Type': 'application/json' },
          body: method === 'PATCH' ? JSON.stringify({ role: 'owner' }) : undefined,
        });
        expect([400, 403, 404, 405], `${method} ${url}`).toContain(res.status);
      }
    }
  });
});
