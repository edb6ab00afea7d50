import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

let app: StartedApp;

beforeAll(async () => {
  app = await startApp(17901);
});

afterAll(async () => {
  await app?.stop();
});

describe('npm start', () => {
  test('serves the landing page and a healthy /api/health', async () => {
    const home = await fetch(`${app.url}/`);
    expect(home.status).toBe(200);
    expect(await home.text()).toContain('Drainwright');
    const health = await fetch(`${app.url}/api/health`);
    expect(health.status).toBe(200);
    expect(await health.json()).toMatchObject({ status: 'ok', version: expect.any(String) });
  });

  test('sends the security headers on pages, static files and API answers', async () => {
    for (const route of ['/', '/favicon.svg', '/api/health', '/api/v1/water', '/no-such-page']) {
      const res = await fetch(`${app.url}${route}`);
      expect(res.headers.get('x-content-type-options'), route).toBe('nosniff');
      const csp = res.headers.get('content-security-policy');
      expect(csp, route).toContain("frame-ancestors 'none'");
      // JSON answers load nothing: the API's policy is default-src 'none', the pages' narrower.
      if (route.startsWith('/api/v1/'))
        expect(csp, route).toBe("default-src 'none'; frame-ancestors 'none'");
      else expect(csp, route).toContain("object-src 'none'");
      expect(res.headers.get('referrer-policy'), route).toBe('strict-origin-when-cross-origin');
      // HSTS only in production, where the site is served over HTTPS.
      expect(res.headers.get('strict-transport-security'), route).toBeNull();
    }
  });

  test('answers an unknown address with the 404 page', async () => {
    const res = await fetch(`${app.url}/no-such-page`);
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('Nothing at this address');
  });

  test('creates the database, keeps a generated auth secret and prints the demo sign-ins', () => {
    expect(fs.existsSync(path.join(app.dataDir, 'drainwright.sqlite'))).toBe(true);
    expect(fs.readFileSync(path.join(app.dataDir, 'auth-secret'), 'utf8').length).toBeGreaterThan(
      30,
    );
    expect(app.output()).toContain('rosa@heronsgate.example');
    expect(app.output()).toContain('demo data seeded');
  });

  test('stops the server and fakes on Ctrl-C and frees its port', async () => {
    // npm itself dies of the signal; what matters is that nothing it started keeps running.
    await app.stop('SIGINT');
    await new Promise((r) => setTimeout(r, 1500));
    await expect(
      fetch(`${app.url}/api/health`, { signal: AbortSignal.timeout(1000) }),
    ).rejects.toThrow();
  });

  test('stops everything when only npm is sent SIGTERM', async () => {
    const second = await startApp(17902);
    second.child.kill('SIGTERM');
    await new Promise((r) => setTimeout(r, 2500));
    // The app and its fakes (e-mail on PORT+10000, payments on PORT+12000) are all gone.
    for (const url of [second.url, 'http://127.0.0.1:27902', 'http://127.0.0.1:29902']) {
      await expect(
        fetch(`${url}/api/health`, { signal: AbortSignal.timeout(1000) }),
      ).rejects.toThrow();
    }
  });
});
