import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { flags } from '../../db/schema';
import type { Db } from '../../src/lib/db/client';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import {
  assertPortFree,
  appDb,
  prepareDesk,
  sessionCookie,
  threadLink,
  waitForEmail,
} from './helpers';

// POST /api/flags end to end: validation, the reporter's e-mail with its link, a reply by e-mail
// through the real resend SDK into the e-mail fake, and the reporter's own views.
const PORT = 16602;
const FAKE = `http://127.0.0.1:${PORT + 10_000}`;

const snapshot = {
  inputs: {
    line: { inner_diameter_m: 0.025, length_m: 10, material: 'garden-hose' },
    source_level_m: 1,
    outlet_elevation_m: 0,
  },
  results: { flow_m3_s: 0.001 },
  engineVersion: '1.0.0',
  unitSystem: 'metric',
  page: '/check?mode=line',
};

let app: StartedApp;
let db: Db;
let desk: string;
let tomas: string;
let rosa: string;

function post(path: string, body: unknown, cookie?: string): Promise<Response> {
  return fetch(`${app.url}${path}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', ...(cookie ? { Cookie: cookie } : {}) },
    body: typeof body === 'string' ? body : JSON.stringify(body),
  });
}

async function page(path: string, cookie?: string): Promise<{ status: number; html: string }> {
  const res = await fetch(`${app.url}${path}`, {
    headers: cookie ? { Cookie: cookie } : {},
    redirect: 'manual',
  });
  return { status: res.status, html: await res.text() };
}

beforeAll(async () => {
  await assertPortFree(PORT);
  app = await startApp(PORT, { FLAGS_PER_WINDOW: '1000' });
  db = appDb(app.dataDir);
  prepareDesk(db);
  desk = sessionCookie(db, 'usr_demo_support');
  tomas = sessionCookie(db, 'usr_demo_crew1');
  rosa = sessionCookie(db, 'usr_demo_owner');
});

afterAll(async () => {
  db?.$client.close();
  await app?.stop();
});

describe('POST /api/flags', () => {
  test('does ask a signed-out reporter for an e-mail address', async () => {
    const res = await post('/api/flags', { tool: 'line', reason: 'looks_wrong', snapshot });
    expect(res.status).toBe(400);
    const body = (await res.json()) as { issues: { path: string }[] };
    expect(body.issues.map((i) => i.path)).toEqual(['email']);
  });

  test('does refuse bad bodies with a clear 400, never a 500', async () => {
    const cases: unknown[] = [
      'not json',
      { tool: 'pump', reason: 'looks_wrong', email: 'a@b.example', snapshot },
      { tool: 'line', reason: 'angry', email: 'a@b.example', snapshot },
      { tool: 'line', reason: 'looks_wrong', email: 'not-an-address', snapshot },
      {
        tool: 'line',
        reason: 'looks_wrong',
        email: 'a@b.example',
        snapshot: { ...snapshot, page: 'https://elsewhere.example/' },
      },
      {
        tool: 'line',
        reason: 'looks_wrong',
        email: 'a@b.example',
        snapshot: { ...snapshot, inputs: [1, 2] },
      },
      {
        tool: 'line',
        reason: 'looks_wrong',
        email: 'a@b.example',
        message: 'x'.repeat(4001),
        snapshot,
      },
    ];
    for (const body of cases) {
      const res = await post('/api/flags', body);
      expect(res.status, JSON.stringify(body).slice(0, 80)).toBe(400);
      expect(((await res.json()) as { error: string }).error).toBe('invalid_request');
    }
  });

  test('does use the account address when signed in and tie the flag to the organisation', async () => {
    const res = await post(
      '/api/flags',
      { tool: 'line', reason: 'site_differs', snapshot, email: 'ignored@example.org' },
      tomas,
    );
    expect(res.status).toBe(201);
    const { id, email } = (await res.json()) as { id: string; email: string };
    // the answer names the address we write to, so the form can confirm the right one
    expect(email).toBe('tomas@heronsgate.example');
    const row = db.select().from(flags).where(eq(flags.id, id)).get();
    expect(row).toMatchObject({
      reporterUserId: 'usr_demo_crew1',
      reporterEmail: 'tomas@heronsgate.example',
      organisationId: 'org_demo_heronsgate',
    });
    expect((await page('/app/flags', tomas)).html).toContain(`data-flag="${id}"`);
    expect((await page('/app/flags', rosa)).html).not.toContain(`data-flag="${id}"`);
  });
});

describe('the reporter thread', () => {
  const reporter = 'shore.crew@example.org';
  const reply =
    'Your hose is long for that head; the friction loss is most of it. Try the 1 in size.';
  const note = 'Internal: checked against the line tool, figures agree.';

  test('does e-mail the reporter a link, send replies through the e-mail fake, and hide notes', async () => {
    const res = await post('/api/flags', {
      tool: 'line',
      reason: 'looks_wrong',
      email: reporter,
      message: 'Seems slow',
      snapshot,
    });
    expect(res.status).toBe(201);
    const { id, emailed } = (await res.json()) as { id: string; emailed: boolean };
    expect(emailed).toBe(true);
    const first = await waitForEmail(
      FAKE,
      reporter,
      (e) => e.subject === 'We have your flagged result',
    );
    const link = new URL(threadLink(first));
    expect(link.pathname).toMatch(/^\/flags\/[\w-]{43}$/);

    expect((await post(`/api/support/flags/${id}/notes`, { body: note }, desk)).status).toBe(201);
    const sent = await post(`/api/support/flags/${id}/replies`, { body: reply }, desk);
    expect(await sent.json()).toMatchObject({ emailStatus: 'sent', kind: 'reply' });

    const mail = await waitForEmail(
      FAKE,
      reporter,
      (e) => e.subject === 'Reply about your flagged result',
    );
    expect(mail.to).toEqual([reporter]);
    expect(mail.text).toContain(reply);
    expect(mail.text).not.toContain(note);

    const thread = await page(link.pathname);
    expect(thread.status).toBe(200);
    expect(thread.html).toContain('Your hose is long for that head');
    expect(thread.html).not.toContain('Internal: checked');
    expect(thread.html).toContain('Answered');
  });

  test('does not open a thread for a wrong token', async () => {
    const res = await page('/flags/this-token-does-not-exist-anywhere-at-all');
    expect(res.status).toBe(404);
    expect(res.html).not.toContain('data-flag=');
  });
});
