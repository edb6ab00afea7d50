import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import { assertPortFree } from './helpers';

// A small limit so the test reaches it; the default is 10 flags per IP per 15 minutes.
const PORT = 16604;
let app: StartedApp;

beforeAll(async () => {
  await assertPortFree(PORT);
  app = await startApp(PORT, { FLAGS_PER_WINDOW: '3', FLAG_WINDOW_SECONDS: '600' });
});
afterAll(async () => {
  await app?.stop();
});

describe('POST /api/flags rate limit', () => {
  test('does answer 429 with Retry-After once an address has used its flags', async () => {
    const body = JSON.stringify({
      tool: 'siphon',
      reason: 'looks_wrong',
      email: 'busy@example.org',
      snapshot: {
        inputs: {},
        results: {},
        engineVersion: '1.0.0',
        unitSystem: 'metric',
        page: '/siphon',
      },
    });
    const send = (): Promise<Response> =>
      fetch(`${app.url}/api/flags`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body,
      });
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) statuses.push((await send()).status);
    expect(statuses).toEqual([201, 201, 201, 429]);
    const refused = await send();
    expect(refused.status).toBe(429);
    const wait = Number(refused.headers.get('retry-after'));
    expect(wait).toBeGreaterThan(0);
    expect(wait).toBeLessThanOrEqual(600);
  });
});
