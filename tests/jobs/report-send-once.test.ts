import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { sendOnce } from '../../src/lib/report/send-once';
import type { Db } from '../../src/lib/db/client';
import { OWNER_ID, SESSION_COOKIE, appDb, sessionFor } from '../billing/helpers';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

// QA report s23, M1: double-clicking "Send report" e-mailed the client twice.
// Ports from the billing-fixes range 17200–17299.
const APP_PORT = 17221;
const RESEND_PORT = 17222;

describe('sendOnce', () => {
  test('does run one send for two overlapping calls with the same key', async () => {
    let sends = 0;
    const send = async (): Promise<string> => {
      sends += 1;
      await new Promise((r) => setTimeout(r, 20));
      return `msg_${sends}`;
    };
    const [a, b] = await Promise.all([
      sendOnce('org/job', 'key-one-abc', send),
      sendOnce('org/job', 'key-one-abc', send),
    ]);
    expect(sends).toBe(1);
    expect([a, b]).toEqual([
      { id: 'msg_1', repeated: false },
      { id: 'msg_1', repeated: true },
    ]);
    expect((await sendOnce('org/job', 'key-two-abc', send)).id).toBe('msg_2');
    expect((await sendOnce('org/other', 'key-one-abc', send)).id).toBe('msg_3'); // keys are per job
  });

  test('does forget a key whose send failed, so trying again sends', async () => {
    const failing = (): Promise<string> => Promise.reject(new Error('service down'));
    await expect(sendOnce('org/job', 'key-fails-1', failing)).rejects.toThrow('service down');
    expect(await sendOnce('org/job', 'key-fails-1', async () => 'msg_ok')).toEqual({
      id: 'msg_ok',
      repeated: false,
    });
  });
});

describe('report e-mail endpoint', () => {
  let app: StartedApp;
  let db: Db;
  let cookie = '';

  beforeAll(async () => {
    app = await startApp(APP_PORT, {
      FAKE_RESEND_PORT: String(RESEND_PORT),
      FAKE_STRIPE_PORT: '17231',
    });
    db = appDb(app.dataDir);
    cookie = `${SESSION_COOKIE}=${sessionFor(db, OWNER_ID)}`;
  }, 120_000);

  afterAll(async () => {
    db?.$client.close();
    await app?.stop();
  });

  const send = (to: string, idempotencyKey: string): Promise<Response> =>
    fetch(`${app.url}/api/jobs/job_demo_koi/report/email`, {
      method: 'POST',
      headers: { cookie, origin: app.url, 'content-type': 'application/json' },
      body: JSON.stringify({ to, message: '', idempotencyKey }),
    });
  const inbox = async (to: string): Promise<number> => {
    const url = `http://127.0.0.1:${RESEND_PORT}/emails?to=${encodeURIComponent(to)}`;
    const res = await fetch(url, { headers: { Authorization: 'Bearer re_fake_test' } });
    return ((await res.json()) as { data: unknown[] }).data.length;
  };

  test('does e-mail the client once for a double click, and again for a new form key', async () => {
    const to = 'client@ng-sons.example';
    const [a, b] = await Promise.all([send(to, 'form-key-0001'), send(to, 'form-key-0001')]);
    expect([a.status, b.status]).toEqual([202, 202]);
    const bodies = [await a.json(), await b.json()] as { id: string; repeated: boolean }[];
    expect(bodies[0].id).toBe(bodies[1].id);
    expect(bodies.filter((x) => x.repeated)).toHaveLength(1);
    expect(await inbox(to)).toBe(1);
    expect((await send(to, 'form-key-0002')).status).toBe(202);
    expect(await inbox(to)).toBe(2);
  });

  test('does refuse a malformed key with a clear message', async () => {
    const res = await send('client@ng-sons.example', 'bad key!');
    expect(res.status).toBe(400);
    expect(await res.text()).toContain('idempotencyKey');
  });
});
