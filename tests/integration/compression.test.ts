import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

/**
 * Response compression on the real server (npm start). Raw node:http requests, because fetch
 * would decompress the body itself and hide what went over the wire. The expected bodies are
 * the uncompressed responses and the files in dist/client; decoding uses node:zlib (RFC 1952
 * gzip, RFC 7932 brotli), not the code under test.
 */
let app: StartedApp;

interface Raw {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: Buffer;
}

function get(url: string, headers: Record<string, string> = {}, method = 'GET'): Promise<Raw> {
  return new Promise((resolve, reject) => {
    const req = http.request(url, { method, headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () =>
        resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }),
      );
    });
    req.on('error', reject);
    req.end();
  });
}

/** The first built asset in dist/client/_astro whose name ends with `suffix`. */
function asset(suffix: string): { url: string; bytes: Buffer } {
  const dir = path.resolve('dist/client/_astro');
  // One over the 1 KB threshold: smaller files are sent as they are.
  const name = fs
    .readdirSync(dir)
    .find((f) => f.endsWith(suffix) && fs.statSync(path.join(dir, f)).size > 4096);
  if (!name) throw new Error(`no built asset ending ${suffix}`);
  return { url: `/_astro/${name}`, bytes: fs.readFileSync(path.join(dir, name)) };
}

/** A session for the seeded owner, inserted as Auth.js's database sessions store it. */
function signIn(): string {
  const db = new Database(path.join(app.dataDir, 'drainwright.sqlite'));
  const token = `test-compression-${'x'.repeat(24)}`;
  db.prepare(
    'insert or replace into sessions (session_token, user_id, expires) values (?, ?, ?)',
  ).run(token, 'usr_demo_owner', Date.now() + 3_600_000);
  db.close();
  return `authjs.session-token=${token}`;
}

beforeAll(async () => {
  app = await startApp(18010);
});

afterAll(async () => {
  await app?.stop();
});

describe('response compression', () => {
  test('does brotli on a page when the client prefers it, and the body decodes to the plain page', async () => {
    const plain = await get(`${app.url}/siphon`);
    const packed = await get(`${app.url}/siphon`, { 'accept-encoding': 'br, gzip' });
    expect(plain.status).toBe(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(packed.headers['content-encoding']).toBe('br');
    expect(packed.headers.vary).toMatch(/accept-encoding/i);
    expect(packed.body.length).toBeLessThan(plain.body.length / 2);
    expect(brotliDecompressSync(packed.body).equals(plain.body)).toBe(true);
  });

  test('does gzip on a script when only gzip is accepted, and the body decodes to the built file', async () => {
    const script = asset('.js');
    const packed = await get(app.url + script.url, { 'accept-encoding': 'gzip' });
    expect(packed.headers['content-encoding']).toBe('gzip');
    expect(packed.headers['content-length']).toBeUndefined();
    expect(gunzipSync(packed.body).equals(script.bytes)).toBe(true);
  });

  test('does gzip on CSS and JSON', async () => {
    const css = asset('.css');
    const packedCss = await get(app.url + css.url, { 'accept-encoding': 'gzip' });
    expect(packedCss.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(packedCss.body).equals(css.bytes)).toBe(true);

    // A signed-in JSON answer rendered by Astro (the /api/v1 short path sends its own, uncompressed).
    const cookie = signIn();
    const plainJson = await get(`${app.url}/api/jobs?pageSize=100`, { cookie });
    const packedJson = await get(`${app.url}/api/jobs?pageSize=100`, {
      cookie,
      'accept-encoding': 'gzip',
    });
    expect(plainJson.status).toBe(200);
    expect(plainJson.headers['content-type']).toMatch(/json/);
    expect(plainJson.body.length).toBeGreaterThan(1024);
    expect(packedJson.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(packedJson.body).equals(plainJson.body)).toBe(true);
  });

  test('does not compress anything when the request has no Accept-Encoding', async () => {
    const script = asset('.js');
    for (const url of ['/siphon', script.url, '/manifest.webmanifest']) {
      const res = await get(app.url + url);
      expect(res.headers['content-encoding'], url).toBeUndefined();
    }
    const res = await get(app.url + script.url);
    expect(Number(res.headers['content-length'])).toBe(script.bytes.length);
    expect(res.body.equals(script.bytes)).toBe(true);
  });

  test('does not compress tiny responses or already-compressed fonts', async () => {
    const icon = await get(`${app.url}/favicon.svg`, { 'accept-encoding': 'br, gzip' });
    expect(icon.status).toBe(200);
    expect(icon.body.length).toBeLessThan(1024);
    expect(icon.headers['content-encoding']).toBeUndefined();

    const font = asset('.woff2');
    const res = await get(app.url + font.url, { 'accept-encoding': 'br, gzip' });
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(Number(res.headers['content-length'])).toBe(font.bytes.length);
  });

  test('does not compress a byte range or a HEAD request', async () => {
    const script = asset('.js');
    const range = await get(app.url + script.url, {
      'accept-encoding': 'gzip',
      range: 'bytes=0-99',
    });
    expect(range.status).toBe(206);
    expect(range.headers['content-encoding']).toBeUndefined();
    expect(range.body.equals(script.bytes.subarray(0, 100))).toBe(true);

    const head = await get(app.url + script.url, { 'accept-encoding': 'gzip' }, 'HEAD');
    expect(head.headers['content-encoding']).toBeUndefined();
  });

  test('does not compress a download (CSV export), which keeps its plain bytes', async () => {
    const cookie = signIn();
    const url = `${app.url}/api/jobs/export?format=csv`;
    const plain = await get(url, { cookie });
    const asked = await get(url, { cookie, 'accept-encoding': 'br, gzip' });
    expect(plain.status).toBe(200);
    expect(plain.headers['content-disposition']).toMatch(/^attachment/);
    expect(plain.body.length).toBeGreaterThan(1024);
    expect(asked.headers['content-encoding']).toBeUndefined();
    expect(asked.body.equals(plain.body)).toBe(true);
  });
});
