/**
 * Unknown paths under /api/v1/: the spec names no 404, so the answer is the API's one error
 * shape (`{ error, issues }`, here `not_found`) with CORS, never the site's HTML page. Checked on
 * the Astro catch-all route and on the real built server (`npm start`), whose short path hands
 * unknown paths to Astro.
 */
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { errorSchema } from '../../src/lib/api/schemas-responses';
import { ALL as rest } from '../../src/pages/api/v1/[...rest]';
import type { StartedApp } from '../helpers/server';
import { startApp } from '../helpers/server';
import { callRoute } from './call-route';

let app: StartedApp;

beforeAll(async () => {
  app = await startApp(17002);
}, 300_000);

afterAll(async () => {
  await app?.stop();
});

async function expectNotFound(res: Response): Promise<void> {
  expect(res.status).toBe(404);
  expect(res.headers.get('content-type')).toMatch(/^application\/json/);
  expect(res.headers.get('access-control-allow-origin')).toBe('*');
  const body = errorSchema.parse(await res.json());
  expect(body.error).toBe('not_found');
  expect(body.issues).toHaveLength(1);
}

describe('unknown /api/v1 paths', () => {
  test('does answer the catch-all route with the JSON 404', async () => {
    await expectNotFound(await callRoute(rest, '/api/v1/nope', { method: 'GET' }));
    await expectNotFound(await callRoute(rest, '/api/v1/line/extra', { body: {} }));
  });

  test('does answer JSON 404 over HTTP for any method, and still serves the known routes', async () => {
    await expectNotFound(await fetch(`${app.url}/api/v1/nope`));
    await expectNotFound(await fetch(`${app.url}/api/v1/a/b/c?x=1`, { method: 'DELETE' }));
    await expectNotFound(
      await fetch(`${app.url}/api/v1/lines`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: '{}',
      }),
    );
    expect((await fetch(`${app.url}/api/v1/catalog`)).status).toBe(200);
    expect((await fetch(`${app.url}/api/v1/openapi.json`)).status).toBe(200);
    // Outside /api/v1 the site's own page stays.
    const page = await fetch(`${app.url}/no-such-page`);
    expect(page.status).toBe(404);
    expect(page.headers.get('content-type')).toMatch(/text\/html/);
  });
});
