/**
 * API v1 on the real built server (`npm start`): every error status over HTTP, the 64 KiB cap
 * while streaming, CORS for callers on other sites (Astro's own origin check would answer 403),
 * no cookies, and the rate limit with Retry-After at a low CALC_RATE_LIMIT_PER_MINUTE.
 */
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { errorSchema, siphonResultSchema } from '../../src/lib/api/schemas-responses';
import { solveSiphon } from '../../src/lib/hydraulics';
import type { StartedApp } from '../helpers/server';
import { startApp } from '../helpers/server';
import { siphonRequest } from './samples';

let app: StartedApp;
let limited: StartedApp;

beforeAll(async () => {
  // One after the other: each start rebuilds when sources changed, and two builds would race.
  app = await startApp(16100);
  limited = await startApp(16101, { CALC_RATE_LIMIT_PER_MINUTE: '3' });
}, 300_000);

afterAll(async () => {
  await Promise.all([app?.stop(), limited?.stop()]);
});

const json = { 'content-type': 'application/json' };
const other = 'https://contractor-tools.example';

async function post(
  path: string,
  body: BodyInit,
  headers: Record<string, string> = json,
): Promise<Response> {
  return fetch(`${app.url}${path}`, { method: 'POST', body, headers });
}

async function expectError(res: Response, status: number, error: string): Promise<void> {
  expect(res.status).toBe(status);
  expect(res.headers.get('access-control-allow-origin')).toBe('*');
  expect(errorSchema.parse(await res.json()).error).toBe(error);
}

describe('API v1 over HTTP', () => {
  test('answers a siphon from another site with 200, CORS open, the engine’s result and no cookie', async () => {
    const res = await post('/api/v1/siphon', JSON.stringify(siphonRequest), {
      ...json,
      origin: other,
    });
    expect(res.status).toBe(200);
    expect(res.headers.get('access-control-allow-origin')).toBe('*');
    expect(res.headers.get('set-cookie')).toBeNull();
    const body = siphonResultSchema.parse(await res.json());
    expect(body).toEqual(solveSiphon(structuredClone(siphonRequest)));
  });

  test('answers the CORS preflight with 204 and the allowed method', async () => {
    const res = await fetch(`${app.url}/api/v1/drain`, {
      method: 'OPTIONS',
      headers: { origin: other, 'access-control-request-method': 'POST' },
    });
    expect(res.status).toBe(204);
    expect(res.headers.get('access-control-allow-methods')).toContain('POST');
    expect(res.headers.get('access-control-allow-headers')).toContain('Content-Type');
  });

  test('answers 415 to text/plain, form and missing content types, even from another site', async () => {
    await expectError(
      await post('/api/v1/line', '{}', { 'content-type': 'text/plain', origin: other }),
      415,
      'unsupported_media_type',
    );
    await expectError(
      await post('/api/v1/line', 'a=1', { 'content-type': 'application/x-www-form-urlencoded' }),
      415,
      'unsupported_media_type',
    );
    const form = new FormData();
    form.set('a', '1');
    await expectError(
      await fetch(`${app.url}/api/v1/drain`, {
        method: 'POST',
        body: form,
        headers: { origin: other },
      }),
      415,
      'unsupported_media_type',
    );
    await expectError(
      await fetch(`${app.url}/api/v1/siphon`, { method: 'POST', body: new Uint8Array([123, 125]) }),
      415,
      'unsupported_media_type',
    );
  });

  test('still refuses cross-site form posts to the rest of the app (403)', async () => {
    const res = await post('/api/flags', 'a=1', {
      'content-type': 'application/x-www-form-urlencoded',
      origin: other,
    });
    expect(res.status).toBe(403);
  });

  test('answers 405 with Allow to a wrong method', async () => {
    const res = await fetch(`${app.url}/api/v1/line`);
    expect(res.headers.get('allow')).toBe('POST, OPTIONS');
    await expectError(res, 405, 'method_not_allowed');
    await expectError(
      await fetch(`${app.url}/api/v1/catalog`, { method: 'DELETE' }),
      405,
      'method_not_allowed',
    );
  });

  test('answers 413 to a body over 64 KiB, declared or streamed without a length', async () => {
    const big = JSON.stringify({ pad: 'x'.repeat(70_000) });
    await expectError(await post('/api/v1/line', big), 413, 'payload_too_large');
    // 400 KiB, so the client is still uploading when the 413 goes out: the server must read on
    // (and drop) the rest, or the reset connection loses the answer
    const chunks = new ReadableStream<Uint8Array>({
      start(c) {
        for (let i = 0; i < 100; i++) c.enqueue(new TextEncoder().encode(' '.repeat(4096)));
        c.close();
      },
    });
    const res = await fetch(`${app.url}/api/v1/line`, {
      method: 'POST',
      body: chunks,
      headers: json,
      duplex: 'half',
    } as RequestInit);
    await expectError(res, 413, 'payload_too_large');
  });

  test('answers 400 to malformed JSON, 1e999, deep nesting and an engine-rejected field', async () => {
    await expectError(await post('/api/v1/line', '{"line":'), 400, 'invalid_input');
    await expectError(
      await post('/api/v1/siphon', '{"source_level_m":1e999}'),
      400,
      'invalid_input',
    );
    await expectError(
      await post('/api/v1/drain', '['.repeat(5000) + ']'.repeat(5000)),
      400,
      'invalid_input',
    );
    const res = await post(
      '/api/v1/siphon',
      JSON.stringify({ ...siphonRequest, length_to_crest_m: 99 }),
    );
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe('length_to_crest_m');
  });

  test('answers GET water, catalog and the OpenAPI document', async () => {
    for (const p of ['/api/v1/water?temperature_c=20', '/api/v1/catalog', '/api/v1/openapi.json']) {
      const res = await fetch(`${app.url}${p}`);
      expect(res.status, p).toBe(200);
      expect(res.headers.get('content-type'), p).toContain('application/json');
    }
  });
});

describe("API v1 on the server's short path", () => {
  test('keeps a sane caller X-Request-Id and replaces anything else', async () => {
    const body = JSON.stringify(siphonRequest);
    const kept = await post('/api/v1/siphon', body, { ...json, 'x-request-id': 'crew-7_check' });
    expect(kept.headers.get('x-request-id')).toBe('crew-7_check');
    const replaced = await post('/api/v1/siphon', body, { ...json, 'x-request-id': '<bad id>' });
    expect(replaced.headers.get('x-request-id')).toMatch(/^[0-9a-f-]{36}$/);
  });

  test('answers HEAD without a body, a trailing slash like the bare path, and 404 off the table', async () => {
    const head = await fetch(`${app.url}/api/v1/catalog`, { method: 'HEAD' });
    expect(head.status).toBe(200);
    expect(await head.text()).toBe('');
    const slash = await fetch(`${app.url}/api/v1/water/?temperature_c=20`);
    expect(slash.status).toBe(200);
    expect((await fetch(`${app.url}/api/v1/pumps`)).status).toBe(404);
  });

  test('names the configured public origin as the OpenAPI server, not the Host header', async () => {
    const res = await fetch(`${app.url}/api/v1/openapi.json`, {
      headers: { 'x-forwarded-host': 'attacker.example' },
    });
    const doc = (await res.json()) as { servers: { url: string }[] };
    expect(doc.servers[0].url).toBe(new URL(app.url).origin);
  });

  test('answers 400 to a sender that stops halfway and never finishes the body', async () => {
    const { request } = await import('node:http');
    const url = new URL(`${app.url}/api/v1/siphon`);
    const status = await new Promise<number>((resolve, reject) => {
      const req = request(
        { host: url.hostname, port: url.port, path: url.pathname, method: 'POST', headers: json },
        (res) => {
          res.resume();
          resolve(res.statusCode ?? 0);
          req.destroy();
        },
      );
      req.on('error', reject);
      req.write('{"source_level_m": 2,'); // and nothing more: the 5 s body deadline must answer
    });
    expect(status).toBe(400);
  }, 20_000);

  test('answers a body that arrives in two parts, apart, as it answers the whole', async () => {
    // The short path takes a body that came with the headers from the request's buffer; one
    // still arriving when the turn's batch runs must be read to its end, not answered half.
    const { request } = await import('node:http');
    const url = new URL(`${app.url}/api/v1/siphon`);
    const text = JSON.stringify(siphonRequest);
    const half = Math.floor(text.length / 2);
    const answer = await new Promise<{ status: number; body: string }>((resolve, reject) => {
      const req = request(
        { host: url.hostname, port: url.port, path: url.pathname, method: 'POST', headers: json },
        (res) => {
          let body = '';
          res.setEncoding('utf8').on('data', (d: string) => (body += d));
          res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
        },
      );
      req.on('error', reject);
      req.write(text.slice(0, half));
      setTimeout(() => req.end(text.slice(half)), 300);
    });
    const whole = await post('/api/v1/siphon', text);
    expect(answer.status).toBe(200);
    expect(JSON.parse(answer.body)).toEqual(await whole.json());
  }, 20_000);
});

describe('API v1 rate limit', () => {
  test('answers 429 with Retry-After past CALC_RATE_LIMIT_PER_MINUTE', async () => {
    const call = (): Promise<Response> =>
      fetch(`${limited.url}/api/v1/siphon`, {
        method: 'POST',
        headers: json,
        body: JSON.stringify(siphonRequest),
      });
    for (let i = 0; i < 3; i++) expect((await call()).status).toBe(200);
    const res = await call();
    const wait = Number(res.headers.get('retry-after'));
    expect(wait).toBeGreaterThanOrEqual(1);
    expect(wait).toBeLessThanOrEqual(60);
    await expectError(res, 429, 'rate_limited');
  });
});
