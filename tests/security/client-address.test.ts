/**
 * Per-address limits on the real built server (`npm start`) against forged X-Forwarded-For:
 * without TRUST_PROXY_HOPS the header is ignored, so a client cannot reset the API v1 limit or
 * the flag limit (each flag e-mails the address it names) by sending a new value each time;
 * with TRUST_PROXY_HOPS=1 the entry the proxy appended is the client.
 */
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { StartedApp } from '../helpers/server';
import { startApp } from '../helpers/server';
import { siphonRequest } from '../api/samples';

const LIMITS = {
  CALC_RATE_LIMIT_PER_MINUTE: '2',
  FLAGS_PER_WINDOW: '2',
  FLAG_WINDOW_SECONDS: '600',
};
let direct: StartedApp;
let proxied: StartedApp;

beforeAll(async () => {
  // One after the other: each start rebuilds when sources changed, and two builds would race.
  direct = await startApp(17000, LIMITS);
  proxied = await startApp(17001, { ...LIMITS, TRUST_PROXY_HOPS: '1' });
}, 300_000);

afterAll(async () => {
  await Promise.all([direct?.stop(), proxied?.stop()]);
});

const flag = JSON.stringify({
  tool: 'siphon',
  reason: 'looks_wrong',
  email: 'someone-else@example.org',
  snapshot: {
    inputs: {},
    results: {},
    engineVersion: '1.0.0',
    unitSystem: 'metric',
    page: '/siphon',
  },
});

function calc(app: StartedApp, forwardedFor?: string): Promise<number> {
  const headers: Record<string, string> = { 'content-type': 'application/json' };
  if (forwardedFor) headers['x-forwarded-for'] = forwardedFor;
  return fetch(`${app.url}/api/v1/siphon`, {
    method: 'POST',
    headers,
    body: JSON.stringify(siphonRequest),
  }).then((r) => r.status);
}

function flagIt(app: StartedApp, forwardedFor?: string): Promise<number> {
  const headers: Record<string, string> = { 'content-type': 'application/json' };
  if (forwardedFor) headers['x-forwarded-for'] = forwardedFor;
  return fetch(`${app.url}/api/flags`, { method: 'POST', headers, body: flag }).then(
    (r) => r.status,
  );
}

async function statuses(n: number, call: (i: number) => Promise<number>): Promise<number[]> {
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(await call(i));
  return out;
}

describe('per-address limits without a trusted proxy', () => {
  test('does keep refusing API v1 calls whatever X-Forwarded-For says', async () => {
    expect(await statuses(2, () => calc(direct))).toEqual([200, 200]);
    expect(await statuses(4, (i) => calc(direct, `10.0.0.${i + 1}`))).toEqual([429, 429, 429, 429]);
  });

  test('does keep refusing flags whatever X-Forwarded-For says', async () => {
    expect(await statuses(2, () => flagIt(direct))).toEqual([201, 201]);
    expect(await statuses(4, (i) => flagIt(direct, `7.7.8.${i + 1}`))).toEqual([
      429, 429, 429, 429,
    ]);
  });
});

describe('per-address limits behind one trusted proxy (TRUST_PROXY_HOPS=1)', () => {
  test('does count API v1 calls against the entry the proxy appended', async () => {
    // A forged first entry changes nothing; a different proxy-written entry is another client.
    expect(await statuses(3, (i) => calc(proxied, `6.6.6.${i}, 203.0.113.5`))).toEqual([
      200, 200, 429,
    ]);
    expect(await calc(proxied, '203.0.113.6')).toBe(200);
  });

  test('does count flags against the entry the proxy appended', async () => {
    expect(await statuses(3, (i) => flagIt(proxied, `6.6.6.${i}, 203.0.113.7`))).toEqual([
      201, 201, 429,
    ]);
    expect(await flagIt(proxied, '203.0.113.8')).toBe(201);
  });
});
