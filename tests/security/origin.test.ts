/**
 * Origin checks, generated from the route files: every state-changing handler under src/pages
 * (exported POST/PUT/PATCH/DELETE, or a page that handles a POSTed form) plus the Auth.js
 * endpoints auth-astro injects gets a cross-site request with a valid session cookie, and must
 * answer 403 without acting. Exempt, by the route table's originExempt: /api/v1/** (anonymous,
 * cookie-free, CORS-open: a forged request carries nothing a visitor owns) and
 * /api/webhooks/** (server-to-server; the Stripe signature is its key, and the caller is no
 * browser).
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { ruleFor } from '../../src/lib/auth/access';
import { ROUTES } from '../../src/lib/auth/routes';
import { OWNER, SUPPORT, startSecApp } from './helpers';
import type { SecApp } from './helpers';

const SAMPLES: Record<string, string> = {
  id: 'job_demo_koi',
  cid: 'calc_demo_koi',
  sid: 'share_x',
  userId: 'usr_demo_crew1',
  token: 'tok_x',
};
const UNSAFE = ['POST', 'PUT', 'PATCH', 'DELETE'];
const AUTH_JS = [
  '/api/auth/signin/resend',
  '/api/auth/signout',
  '/api/auth/callback/resend',
  '/api/auth/session',
];

interface Target {
  method: string;
  path: string;
}

/** Every route file under src/pages with the URL pattern Astro serves it at. */
function routeFiles(
  dir = path.resolve('src/pages'),
  root = dir,
): { file: string; route: string }[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return routeFiles(full, root);
    if (!/\.(astro|ts)$/.test(e.name)) return [];
    const route =
      '/' +
      path
        .relative(root, full)
        .replace(/\.(astro|ts)$/, '')
        .replace(/(^|\/)index$/, '');
    return [{ file: full, route: route.replace(/\/$/, '') || '/' }];
  });
}

/** Every state-changing (method, concrete path) the route files declare. */
function targets(): Target[] {
  const out: Target[] = [];
  for (const { file, route } of routeFiles()) {
    const src = fs.readFileSync(file, 'utf8');
    const concrete = route.replace(/\[(\w+)\]/g, (_m, name: string) => SAMPLES[name] ?? 'x1');
    const methods = file.endsWith('.astro')
      ? /method\s*===\s*'POST'/.test(src)
        ? ['POST']
        : []
      : UNSAFE.filter((m) => new RegExp(`export const (${m}|ALL)\\b`).test(src));
    for (const method of methods) out.push({ method, path: concrete });
  }
  for (const p of AUTH_JS) out.push({ method: 'POST', path: p });
  return out;
}

const ALL = targets();
const guarded = ALL.filter((t) => !ruleFor(t.path).originExempt);
let sec: SecApp;

beforeAll(async () => {
  sec = await startSecApp(19550);
}, 120_000);
afterAll(async () => {
  await sec?.stop();
});

const cookieFor = (p: string): string => sec.as(p.includes('/support') ? SUPPORT : OWNER).cookie;

describe('origin check on state-changing routes', () => {
  test('does find the routes (the generator is not empty) and exempts only API v1 and webhooks', () => {
    expect(guarded.length).toBeGreaterThan(30);
    expect(
      ROUTES.filter((r) => r.originExempt)
        .map((r) => r.pattern)
        .sort(),
    ).toEqual(['/api/v1/**', '/api/webhooks/**']);
  });

  test.each(guarded.map((t) => [t.method, t.path]))(
    'does refuse a cross-site %s %s with 403',
    async (method, p) => {
      const base = { cookie: cookieFor(p) };
      const variants: Record<string, string>[] = [
        { ...base, origin: 'https://evil.example', 'content-type': 'application/json' },
        { ...base, origin: 'null', 'content-type': 'application/x-www-form-urlencoded' },
        { ...base, 'sec-fetch-site': 'cross-site', 'content-type': 'text/plain' },
        // No Origin at all but a form type: what an old browser's cross-site form would send.
        { ...base, 'content-type': 'multipart/form-data; boundary=x' },
      ];
      for (const headers of variants) {
        const r = await fetch(`${sec.app.url}${p}`, {
          method,
          headers,
          body: method === 'DELETE' ? undefined : '{}',
          redirect: 'manual',
        });
        expect(r.status, `${method} ${p} ${JSON.stringify(headers)}`).toBe(403);
      }
    },
  );

  test('does leave the data alone after a refused cross-site delete and edit', async () => {
    const evil = {
      cookie: cookieFor('/api/jobs'),
      origin: 'https://evil.example',
      'content-type': 'application/json',
    };
    await fetch(`${sec.app.url}/api/jobs/job_demo_koi`, { method: 'DELETE', headers: evil });
    await fetch(`${sec.app.url}/api/jobs/job_demo_basement`, {
      method: 'PATCH',
      headers: evil,
      body: JSON.stringify({ title: 'hijacked' }),
    });
    const rows = sec.db
      .prepare("select id, title from jobs where id in ('job_demo_koi','job_demo_basement')")
      .all() as { title: string }[];
    expect(rows).toHaveLength(2);
    expect(rows.map((r) => r.title)).not.toContain('hijacked');
  });

  test('does let the same request through from the app itself (the check is not a blanket 403)', async () => {
    const job = await fetch(`${sec.app.url}/api/jobs/job_demo_basement`, { headers: sec.as(OWNER) });
    const { revision } = (await job.json()).job;
    const r = await fetch(`${sec.app.url}/api/jobs/job_demo_basement`, {
      method: 'PATCH',
      headers: sec.as(OWNER),
      body: JSON.stringify({ status: 'quoted', revision }),
    });
    expect(r.status).toBe(200);
  });

  test('does answer API v1 from any origin (no cookies used) and leave webhooks to their signature', async () => {
    const v1 = await fetch(`${sec.app.url}/api/v1/line`, {
      method: 'POST',
      headers: { origin: 'https://elsewhere.example', 'content-type': 'application/json' },
      body: '{}',
    });
    expect(v1.status).toBe(400);
    expect(v1.headers.get('access-control-allow-origin')).toBe('*');
    const hook = await fetch(`${sec.app.url}/api/webhooks/stripe`, {
      method: 'POST',
      headers: { origin: 'https://evil.example', 'content-type': 'application/json' },
      body: '{}',
    });
    expect(hook.status).toBe(400);
  });
});
