import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, afterEach, beforeAll, describe, expect, inject, test } from 'vitest';
import { openDatabase } from '../../src/lib/db/client';
import { checkDatabase, healthReport } from '../../src/lib/health';
import { freshDb } from '../helpers/db';

describe('checkDatabase', () => {
  test('does report ok after a real query on a migrated database', () => {
    const { db } = freshDb();
    expect(checkDatabase(() => db)).toMatchObject({ status: 'ok', ms: expect.any(Number) });
  });

  test('does report failed when the database connection is closed', () => {
    const { db } = freshDb();
    db.$client.close();
    expect(checkDatabase(() => db)).toMatchObject({ status: 'failed', reason: 'did not answer' });
  });

  test('does report failed when the database cannot be opened', () => {
    const { dir } = freshDb();
    fs.rmSync(dir, { recursive: true, force: true });
    fs.writeFileSync(dir, 'not a folder');
    const result = checkDatabase(() => openDatabase(`${dir}/x/test.sqlite`));
    expect(result).toMatchObject({ status: 'failed', reason: expect.any(String) });
  });

  test('does report failed on an empty, unmigrated database', () => {
    const { dir } = freshDb();
    const result = checkDatabase(() => openDatabase(`${dir}/empty.sqlite`));
    expect(result).toMatchObject({ status: 'failed', reason: 'no migrations applied' });
  });
});

// The real SDKs against the fakes the test setup started; env changed per test, then restored.
describe('healthReport', () => {
  const saved = { ...process.env };
  let silent: http.Server;
  let silentPort = 0;
  const { db } = freshDb();

  beforeAll(async () => {
    Object.assign(process.env, inject('fakeEnv'), { HEALTH_SERVICE_TTL_MS: '0' });
    Object.assign(saved, process.env);
    // Accepts connections and never answers: a service that hangs.
    silent = http.createServer(() => undefined);
    await new Promise<void>((r) => silent.listen(0, '127.0.0.1', r));
    silentPort = (silent.address() as AddressInfo).port;
  });
  afterEach(() => {
    for (const key of Object.keys(process.env)) if (!(key in saved)) delete process.env[key];
    Object.assign(process.env, saved);
  });
  afterAll(() => {
    silent.closeAllConnections();
    silent.close();
  });

  test('does pass the database, e-mail and billing checks against the running fakes', async () => {
    const report = await healthReport(() => db);
    expect(report.status).toBe('ok');
    for (const name of ['database', 'email', 'billing'] as const) {
      expect(report.checks[name]).toMatchObject({
        status: 'ok',
        required: true,
        ms: expect.any(Number),
      });
    }
  });

  test('does fail (unavailable) when the e-mail service is unreachable', async () => {
    process.env.RESEND_BASE_URL = 'http://127.0.0.1:9'; // discard port: nothing listens
    const report = await healthReport(() => db);
    expect(report.status).toBe('unavailable');
    expect(report.checks.email).toMatchObject({ status: 'failed', reason: 'unreachable' });
    expect(report.checks.billing.status).toBe('ok');
  });

  test('does give up on a service that hangs within the configured timeout', async () => {
    process.env.STRIPE_API_PORT = String(silentPort);
    process.env.HEALTH_TIMEOUT_MS = '300';
    const report = await healthReport(() => db);
    expect(report.status).toBe('unavailable');
    expect(report.checks.billing).toMatchObject({
      status: 'failed',
      reason: 'no answer within 300 ms',
    });
    // Timeout 300 ms, no retries: well under the SDK's own 20 s timeout (tolerance 1.5 s for load).
    expect(report.checks.billing.ms).toBeLessThan(1800);
  });

  test('does report a refused payments key without echoing it', async () => {
    process.env.STRIPE_SECRET_KEY = 'rk_not_a_secret_key_shape_12345';
    const report = await healthReport(() => db);
    expect(report.checks.billing).toMatchObject({ status: 'failed', reason: 'key refused' });
    expect(JSON.stringify(report)).not.toContain('rk_not_a_secret');
  });

  test('does stay up (degraded) when only an optional check fails', async () => {
    process.env.STRIPE_API_PORT = '9';
    process.env.HEALTH_OPTIONAL = 'billing';
    const report = await healthReport(() => db);
    expect(report.status).toBe('degraded');
    expect(report.checks.billing).toMatchObject({ status: 'failed', required: false });
  });

  test('does skip billing when no payments key is configured, and fail e-mail without one', async () => {
    delete process.env.STRIPE_SECRET_KEY;
    delete process.env.RESEND_API_KEY;
    const report = await healthReport(() => db);
    expect(report.checks.billing).toMatchObject({ status: 'skipped', required: false });
    expect(report.checks.email).toMatchObject({ status: 'failed', reason: 'not configured' });
    expect(report.status).toBe('unavailable');
  });
});
