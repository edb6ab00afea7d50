import { execFileSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

// The real start command; its fakes listen on PORT+10000 (e-mail) and PORT+12000 (payments).
const PORT = 19020;
let app: StartedApp;

beforeAll(async () => {
  app = await startApp(PORT, { HEALTH_SERVICE_TTL_MS: '0', HEALTH_TIMEOUT_MS: '1000' });
}, 180_000);

afterAll(async () => {
  await app?.stop();
});

/** PID of the process in the app's process group whose command line mentions `entry`. */
function pidOf(entry: string): number {
  const rows = execFileSync('ps', ['-eo', 'pid=,pgid=,args='], { encoding: 'utf8' }).split('\n');
  const row = rows.find((r) => {
    const [, pgid] = r.trim().split(/\s+/);
    return Number(pgid) === app.child.pid && r.includes(entry);
  });
  if (!row) throw new Error(`no ${entry} process in the app's group`);
  return Number(row.trim().split(/\s+/)[0]);
}

describe('GET /api/health on the built app', () => {
  test('does answer 200 with every check ok and its timing', async () => {
    const res = await fetch(`${app.url}/api/health`);
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('no-store');
    const body = await res.json();
    expect(body).toMatchObject({ status: 'ok', version: expect.any(String) });
    expect(Object.keys(body.checks).sort()).toEqual(['billing', 'database', 'email']);
    for (const check of Object.values(body.checks)) {
      expect(check).toMatchObject({ status: 'ok', required: true, ms: expect.any(Number) });
    }
  });

  test('does answer 503 naming the payments check once its fake is stopped', async () => {
    process.kill(pidOf('fakes/stripe/server.ts'), 'SIGKILL');
    await new Promise((r) => setTimeout(r, 300));
    const res = await fetch(`${app.url}/api/health`);
    expect(res.status).toBe(503);
    const body = await res.json();
    expect(body.status).toBe('unavailable');
    expect(body.checks.billing).toMatchObject({ status: 'failed', reason: 'unreachable' });
    expect(body.checks.database.status).toBe('ok');
    expect(body.checks.email.status).toBe('ok');
    expect(JSON.stringify(body)).not.toMatch(/sk_|whsec_|re_fake/);
  });
});
