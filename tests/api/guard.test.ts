/**
 * The envelope every API v1 operation runs in (src/lib/api/guard.ts). The server's short path
 * relies on it adding no promise when the rate limit is off and the handler answers at once.
 * Expected statuses and codes are those of ../shared/api-v1.md.
 */
import { afterEach, describe, expect, test, vi } from 'vitest';
import type { ApiAnswer, ApiRequest } from '../../src/lib/api/answer';
import { jsonAnswer } from '../../src/lib/api/answer';
import { guarded } from '../../src/lib/api/guard';
import { siphonOperation } from '../../src/lib/api/v1-operations';
import { siphonRequest } from './samples';

const request: ApiRequest = {
  method: 'POST',
  url: new URL('http://127.0.0.1/api/v1/siphon'),
  header: () => null,
  readBody: () => Promise.resolve({ ok: true, bytes: new Uint8Array(0) }),
  clientAddress: '192.0.2.7',
  requestId: 'guard-test',
};

afterEach(() => {
  vi.unstubAllEnvs();
});

describe('guarded', () => {
  test('does answer synchronously, with CORS and no-store, when the limit is off', () => {
    vi.stubEnv('CALC_RATE_LIMIT_PER_MINUTE', '0');
    const answer = guarded(() => jsonAnswer(200, { ok: 1 }))(request);
    expect(answer).not.toBeInstanceOf(Promise);
    const { status, headers } = answer as ApiAnswer;
    expect(status).toBe(200);
    expect(headers['Access-Control-Allow-Origin']).toBe('*');
    expect(headers['Cache-Control']).toBe('no-store');
  });

  test('does turn a thrown error or a rejection into a 400 saying the inputs give no finite result', async () => {
    vi.stubEnv('CALC_RATE_LIMIT_PER_MINUTE', '0');
    const thrown = guarded(() => {
      throw new Error('boom');
    })(request) as ApiAnswer;
    const rejected = await guarded(() => Promise.reject(new Error('boom')))(request);
    for (const answer of [thrown, rejected]) {
      // The spec allows no 422 or 500 for any input: 400 invalid_input, request id in the issue.
      expect(answer.status).toBe(400);
      expect(answer.body).toMatchObject({ error: 'invalid_input' });
      const [issue] = (answer.body as { issues: { path: string; message: string }[] }).issues;
      expect(issue.path).toBe('');
      expect(issue.message).toMatch(/no finite result \(request guard-test\)/);
      expect(answer.headers['Access-Control-Allow-Origin']).toBe('*');
    }
  });

  test('does refuse with 429 and Retry-After once the limit is reached', async () => {
    vi.stubEnv('CALC_RATE_LIMIT_PER_MINUTE', '2');
    const op = guarded(() => jsonAnswer(200, { ok: 1 }));
    const other = { ...request, clientAddress: '192.0.2.8' };
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++) statuses.push((await op(other)).status);
    expect(statuses).toEqual([200, 200, 429]);
    const refused = await op(other);
    expect(Number(refused.headers['Retry-After'])).toBeGreaterThanOrEqual(1);
    expect(refused.headers['Access-Control-Allow-Origin']).toBe('*');
  });

  test('does answer a body the server has read already synchronously, as it would the same body read later', async () => {
    vi.stubEnv('CALC_RATE_LIMIT_PER_MINUTE', '0');
    const bytes = new TextEncoder().encode(JSON.stringify(siphonRequest));
    const header = (name: string): string | null =>
      name === 'content-type' ? 'application/json' : null;
    const read = { ...request, header, readBody: () => ({ ok: true as const, bytes }) };
    const later = { ...read, readBody: () => Promise.resolve({ ok: true as const, bytes }) };
    const now = siphonOperation(read);
    expect(now).not.toBeInstanceOf(Promise);
    expect((now as ApiAnswer).status).toBe(200);
    expect(now).toEqual(await siphonOperation(later));
  });
});
