/**
 * Error paths leak nothing: bad JSON, wrong shapes, huge numbers, unknown ids, broken URLs and
 * methods a route does not have. Every answer is a clear 4xx (never a 500), and no body carries a
 * stack line, a file path, the AUTH_SECRET, a service key or a session token.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { FAKE_RESEND_KEY } from '../../fakes/resend/spec';
import { FAKE_STRIPE_KEY, FAKE_STRIPE_WEBHOOK_SECRET } from '../../fakes/stripe/spec';
import { OWNER, SUPPORT, startSecApp } from './helpers';
import type { SecApp } from './helpers';

let sec: SecApp;
let secrets: string[];

beforeAll(async () => {
  sec = await startSecApp(19570);
  const authSecret = fs.readFileSync(path.join(sec.app.dataDir, 'auth-secret'), 'utf8').trim();
  secrets = [authSecret, FAKE_RESEND_KEY, FAKE_STRIPE_KEY, FAKE_STRIPE_WEBHOOK_SECRET];
}, 120_000);
afterAll(async () => {
  await sec?.stop();
});

type Probe = [method: string, path: string, body?: string, contentType?: string];

const BAD_BODIES = [
  '{',
  '[]',
  'null',
  '"x"',
  '{"a":1e999}',
  '['.repeat(50_000) + ']'.repeat(50_000),
  '\u0000\uffff',
];
const JSON_ROUTES: [string, string][] = [
  ['POST', '/api/jobs'],
  ['PATCH', '/api/jobs/job_demo_koi'],
  ['POST', '/api/jobs/job_demo_koi/calculations'],
  ['POST', '/api/jobs/job_demo_koi/shares'],
  ['POST', '/api/jobs/job_demo_koi/report/email'],
  ['PUT', '/api/brand'],
  ['POST', '/api/team/invitations'],
  ['PATCH', '/api/team/members/usr_demo_crew1'],
  ['POST', '/api/billing/checkout'],
  ['POST', '/api/billing/seats'],
  ['POST', '/api/flags'],
  ['POST', '/api/support/flags/flg_demo_tank_wall/notes'],
  ['PATCH', '/api/support/flags/flg_demo_tank_wall'],
  ['POST', '/api/v1/siphon'],
  ['POST', '/api/webhooks/stripe'],
];
const PROBES: Probe[] = [
  ...JSON_ROUTES.flatMap(([m, p]) => BAD_BODIES.map((b): Probe => [m, p, b])),
  ...JSON_ROUTES.map(([m, p]): Probe => [m, p, '{}', 'text/plain']),
  [
    'POST',
    '/api/jobs/job_demo_koi/calculations',
    JSON.stringify({
      tool: 'siphon',
      inputs: { source_level_m: 1e308, line: { inner_diameter_m: -1 } },
      unitSystem: 'metric',
    }),
  ],
  ['GET', '/api/jobs/nope'],
  ['GET', '/api/jobs/nope/calculations/nope'],
  ['DELETE', '/api/jobs/nope/shares/nope'],
  ['GET', '/app/jobs/nope'],
  ['GET', '/app/jobs/nope/report.pdf'],
  ['GET', '/r/nope'],
  ['GET', '/r/nope/report.pdf'],
  ['GET', '/flags/nope'],
  ['GET', '/support/flags/nope'],
  ['GET', '/api/support/flags/nope'],
  ['GET', '/invite/nope'],
  ['GET', '/app/jobs/%E0%A4%A'],
  ['GET', '/api/jobs?page=1e309&pageSize=-1&sort=__proto__'],
  ['GET', '/api/jobs/export?format=../../etc/passwd'],
  ['GET', '/api/auth/callback/resend?token=nope&email=x%40y.test'],
  ['GET', '/api/auth/nonsense'],
  ['PUT', '/api/health'],
  ['DELETE', '/api/v1/line'],
];

const STACK = /^\s*at .+(\(|:\d+:\d+)|node_modules|\/work\/|file:\/\/|\.(ts|mjs|js):\d+/m;

describe('error answers', () => {
  test('does answer every probe with a 4xx and no stack, path, secret or token', async () => {
    const problems: string[] = [];
    for (const [method, p, body, type] of PROBES) {
      const user = p.includes('/support') ? SUPPORT : OWNER;
      const signedIn = sec.as(user);
      const token = signedIn.cookie.split('=')[1];
      const headers: Record<string, string> = {
        ...signedIn,
        ...(type ? { 'content-type': type } : {}),
      };
      const r = await fetch(`${sec.app.url}${p}`, { method, headers, body, redirect: 'manual' });
      const text = await r.text();
      const where = `${method} ${p} ${body?.slice(0, 20) ?? ''} → ${r.status}`;
      if (r.status >= 500 && !(p.includes('report/email') && r.status === 502))
        problems.push(`${where}: server error`);
      if (STACK.test(text)) problems.push(`${where}: stack or path in ${text.slice(0, 200)}`);
      for (const s of [...secrets, token])
        if (text.includes(s)) problems.push(`${where}: leaks a secret`);
      if (r.headers.getSetCookie().some((c) => c.includes(token)))
        problems.push(`${where}: echoes the session`);
    }
    expect(problems).toEqual([]);
  }, 120_000);

  test('does keep secrets and session tokens out of the server log too', () => {
    const log = sec.app.output();
    const tokens = (
      sec.db.prepare('select session_token as t from sessions').all() as { t: string }[]
    ).map((r) => r.t);
    expect(tokens.length).toBeGreaterThan(10);
    for (const s of [...secrets, ...tokens]) expect(log.includes(s), 'secret in log').toBe(false);
  });
});
