/**
 * Length limits (a clear 400 naming the field, and text at the limit accepted whole), the
 * server-wide body cap (declared or streamed), and the sign-in e-mail rate limit. API v1's 64 KiB
 * and rate limit are proven in tests/api/server.test.ts, the flag rate limit in
 * tests/support/rate-limit.test.ts, the 2 MB logo in tests/jobs/brand-report.test.ts.
 */
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { siphonRequest } from '../api/samples';
import { OWNER, SUPPORT, startSecApp } from './helpers';
import type { SecApp } from './helpers';

let sec: SecApp;

beforeAll(async () => {
  sec = await startSecApp(19560);
}, 120_000);
afterAll(async () => {
  await sec?.stop();
});

const x = (n: number): string => 'x'.repeat(n);
const flag = (message: string): object => ({
  tool: 'siphon',
  reason: 'need_help',
  message,
  email: 'limits@example.test',
  snapshot: {
    inputs: {},
    results: {},
    engineVersion: '1.0.0',
    unitSystem: 'metric',
    page: '/siphon',
  },
});

function send(method: string, path: string, body: unknown, user = OWNER): Promise<Response> {
  return fetch(`${sec.app.url}${path}`, {
    method,
    headers: sec.as(user),
    body: JSON.stringify(body),
  });
}

describe('length limits', () => {
  const brand = { companyName: 'Heronsgate', primaryColour: '#12343b', accentColour: '#1b7f86' };
  test.each([
    ['job title', 'POST', '/api/jobs', { title: x(201) }, 'title'],
    ['job site address', 'POST', '/api/jobs', { title: 'a', siteAddress: x(501) }, 'siteAddress'],
    ['job notes', 'POST', '/api/jobs', { title: 'a', notes: x(20_001) }, 'notes'],
    [
      'calculation label',
      'POST',
      '/api/jobs/job_demo_koi/calculations',
      { tool: 'siphon', label: x(201), inputs: siphonRequest, unitSystem: 'metric' },
      'label',
    ],
    ['company name', 'PUT', '/api/brand', { ...brand, companyName: x(121) }, 'companyName'],
    ['report footer', 'PUT', '/api/brand', { ...brand, reportFooter: x(601) }, 'reportFooter'],
    ['flag message', 'POST', '/api/flags', flag(x(4001)), 'message'],
    [
      'report e-mail note',
      'POST',
      '/api/jobs/job_demo_koi/report/email',
      { to: 'c@example.test', message: x(2001) },
      'message',
    ],
  ])(
    'does answer 400 naming the field for an over-long %s',
    async (_what, method, path, body, field) => {
      const r = await send(method, path, body);
      expect(r.status).toBe(400);
      const issues = ((await r.json()) as { issues: { path: string; message: string }[] }).issues;
      expect(issues.map((i) => i.path)).toContain(field);
      expect(issues.find((i) => i.path === field)?.message).toMatch(/at most|<=\d+|too big/i);
    },
  );

  test('does answer 400 for an over-long support note, invitation address and member name', async () => {
    expect(
      (
        await send(
          'POST',
          '/api/support/flags/flg_demo_tank_wall/notes',
          { body: x(8001) },
          SUPPORT,
        )
      ).status,
    ).toBe(400);
    expect(
      (await send('POST', '/api/team/invitations', { email: `${x(250)}@example.test` })).status,
    ).toBe(400);
    const form = new URLSearchParams({ name: x(81) });
    const headers = {
      ...sec.as(OWNER, false),
      'content-type': 'application/x-www-form-urlencoded',
    };
    const page = await fetch(`${sec.app.url}/app/account`, { method: 'POST', headers, body: form });
    expect(page.status).toBe(400);
    expect(await page.text()).toContain('1 to 80 characters');
  });

  test('does keep text at the limit whole, multi-byte and right-to-left included', async () => {
    const title = 'ملف'.repeat(66) + 'ab'; // 200 UTF-16 units
    const notes = '𝔇'.repeat(10_000); // 20 000 UTF-16 units, 40 000 bytes
    const r = await send('POST', '/api/jobs', { title, notes });
    expect(r.status).toBe(201);
    const { job } = (await r.json()) as { job: { id: string; title: string; notes: string } };
    expect(job.title).toBe(title);
    expect(job.notes).toBe(notes);
    const page = await fetch(`${sec.app.url}/app/jobs/${job.id}`, {
      headers: sec.as(OWNER, false),
    });
    expect(page.status).toBe(200);
    expect(await page.text()).toContain(title);
  });
});

describe('request body cap', () => {
  test('does answer 413 to a declared body over 1 MiB before reading it, on JSON and form routes', async () => {
    const big = JSON.stringify(flag(x(1_200_000)));
    const json = await fetch(`${sec.app.url}/api/flags`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: sec.app.url },
      body: big,
    });
    expect(json.status).toBe(413);
    expect(((await json.json()) as { error: string }).error).toBe('payload_too_large');
    const headers = {
      ...sec.as(OWNER, false),
      'content-type': 'application/x-www-form-urlencoded',
    };
    const form = await fetch(`${sec.app.url}/app/account`, {
      method: 'POST',
      headers,
      body: `name=${x(1_200_000)}`,
    });
    expect(form.status).toBe(413);
    const logo = new FormData();
    logo.set('logo', new Blob([new Uint8Array(3 * 1024 * 1024)], { type: 'image/png' }), 'big.png');
    expect(
      (
        await fetch(`${sec.app.url}/api/brand/logo`, {
          method: 'POST',
          headers: sec.as(OWNER, false),
          body: logo,
        })
      ).status,
    ).toBe(413);
  });

  // Past the cap the server stops reading and hangs up: the client sees a 4xx, or (when it is
  // still uploading as the answer goes out) a reset connection. Never a 500, never a stalled server.
  test('does cut off a streamed body past the cap with a 4xx or a hang-up, never a 500', async () => {
    // Valid JSON padded with 2.5 MiB of spaces inside the object: accepted if nothing cut it off.
    const stream = (body: object): ReadableStream<Uint8Array> => {
      const text = JSON.stringify(body);
      return new ReadableStream({
        start(c) {
          c.enqueue(new TextEncoder().encode(text.slice(0, -1)));
          for (let i = 0; i < 40; i++) c.enqueue(new Uint8Array(64 * 1024).fill(0x20));
          c.enqueue(new TextEncoder().encode('}'));
          c.close();
        },
      });
    };
    const cases: [string, object][] = [
      ['/api/flags', flag('padded')],
      ['/api/team/invitations', { email: 'padded@example.test' }],
      ['/api/jobs', { title: 'padded' }],
    ];
    for (const [path, body] of cases) {
      const init = {
        method: 'POST',
        headers: sec.as(OWNER),
        body: stream(body),
        duplex: 'half',
      } as RequestInit;
      const status = await fetch(`${sec.app.url}${path}`, init).then(
        (r) => r.status,
        () => 'hung up',
      );
      expect([400, 413, 'hung up'], `${path} answered ${status}`).toContain(status);
    }
    const invited = sec.db
      .prepare("select count(*) as n from invitations where email = 'padded@example.test'")
      .get() as { n: number };
    expect(invited.n).toBe(0);
    expect((await fetch(`${sec.app.url}/api/health`)).status).toBe(200);
  });
});

describe('sign-in e-mail rate limit', () => {
  const ask = (email: string): Promise<Response> =>
    fetch(`${sec.app.url}/signin`, {
      method: 'POST',
      body: new URLSearchParams({ email }),
      headers: { origin: sec.app.url },
      redirect: 'manual',
    });

  test('does answer 429 with Retry-After after 3 links to one address, and after 10 from one address', async () => {
    const one = [];
    for (let i = 0; i < 4; i++) one.push((await ask('limit-me@example.test')).status);
    expect(one).toEqual([303, 303, 303, 429]);
    const refused = await ask('limit-me@example.test');
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(await refused.text()).toContain('Too many sign-in e-mails');
    // 5 points of the IP's 10 are spent; 5 more addresses pass, the next is refused.
    const many = [];
    for (let i = 0; i < 6; i++) many.push((await ask(`crew${i}@example.test`)).status);
    expect(many).toEqual([303, 303, 303, 303, 303, 429]);
  });
});
