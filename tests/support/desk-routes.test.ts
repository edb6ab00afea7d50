import { and, count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { auditEntries } from '../../db/schema';
import type { Db } from '../../src/lib/db/client';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import { assertPortFree, ADMIN_ID, appDb, prepareDesk, sessionCookie } from './helpers';

// Role tests for every flag and support-desk route, on the real server with the real route table.
const PORT = 16600;
const ROLES = ['anonymous', 'member', 'owner', 'support', 'admin'] as const;
type Role = (typeof ROLES)[number];
const USER_OF: Record<Exclude<Role, 'anonymous'>, string> = {
  member: 'usr_demo_crew1',
  owner: 'usr_demo_owner',
  support: 'usr_demo_support',
  admin: ADMIN_ID,
};
const FLAG = 'flg_demo_tank_wall';

const flagBody = {
  tool: 'line',
  reason: 'need_help',
  email: 'visitor@example.org',
  snapshot: {
    inputs: {
      line: { inner_diameter_m: 0.025, length_m: 10, material: 'garden-hose' },
      source_level_m: 1,
      outlet_elevation_m: 0,
    },
    results: { flow_m3_s: 0.001 },
    engineVersion: '1.0.0',
    unitSystem: 'metric',
    page: '/gravity-line',
  },
};

interface Case {
  method: string;
  path: string;
  body?: unknown;
  /** Expected status per role. */
  want: Record<Role, number>;
}

const page = (staffOk: boolean, adminOnly = false): Record<Role, number> => ({
  anonymous: 302,
  member: 403,
  owner: 403,
  support: staffOk && !adminOnly ? 200 : 403,
  admin: 200,
});
const api = (ok: number, adminOnly = false): Record<Role, number> => ({
  anonymous: 401,
  member: 403,
  owner: 403,
  support: adminOnly ? 403 : ok,
  admin: ok,
});

const CASES: Case[] = [
  { method: 'GET', path: '/support', want: page(true) },
  { method: 'GET', path: `/support/flags/${FLAG}`, want: page(true) },
  { method: 'GET', path: '/support/audit', want: page(true, true) },
  { method: 'GET', path: '/api/support/flags', want: api(200) },
  { method: 'GET', path: `/api/support/flags/${FLAG}`, want: api(200) },
  { method: 'GET', path: `/api/support/flags/${FLAG}/rerun`, want: api(200) },
  {
    method: 'PATCH',
    path: `/api/support/flags/${FLAG}`,
    body: { status: 'in_hand' },
    want: api(200),
  },
  {
    method: 'POST',
    path: `/api/support/flags/${FLAG}/notes`,
    body: { body: 'Checked the crest.' },
    want: api(201),
  },
  {
    method: 'POST',
    path: `/api/support/flags/${FLAG}/replies`,
    body: { body: 'Check the hose joints for air leaks.' },
    want: api(201),
  },
  { method: 'GET', path: '/api/support/audit', want: api(200, true) },
  {
    method: 'POST',
    path: '/api/flags',
    body: flagBody,
    want: { anonymous: 201, member: 201, owner: 201, support: 201, admin: 201 },
  },
  {
    method: 'GET',
    path: '/app/flags',
    want: { anonymous: 302, member: 200, owner: 200, support: 200, admin: 200 },
  },
];

let app: StartedApp;
let db: Db;
const cookie: Partial<Record<Role, string>> = {};

async function call(role: Role, method: string, path: string, body?: unknown): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (cookie[role]) headers.Cookie = cookie[role]!;
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  return fetch(`${app.url}${path}`, {
    method,
    headers,
    body: body === undefined ? undefined : JSON.stringify(body),
    redirect: 'manual',
  });
}

function auditCount(userId: string, action: string): number {
  const [{ n }] = db
    .select({ n: count() })
    .from(auditEntries)
    .where(and(eq(auditEntries.actorUserId, userId), eq(auditEntries.action, action)))
    .all();
  return n;
}

beforeAll(async () => {
  await assertPortFree(PORT);
  app = await startApp(PORT, { FLAGS_PER_WINDOW: '1000' });
  db = appDb(app.dataDir);
  prepareDesk(db);
  for (const role of ROLES)
    if (role !== 'anonymous') cookie[role] = sessionCookie(db, USER_OF[role]);
});

afterAll(async () => {
  db?.$client.close();
  await app?.stop();
});

describe('flag and support routes', () => {
  for (const c of CASES) {
    for (const role of ROLES) {
      test(`does answer ${c.method} ${c.path} for ${role} with ${c.want[role]}`, async () => {
        const res = await call(role, c.method, c.path, c.body);
        expect(res.status).toBe(c.want[role]);
        if (res.status === 302) expect(res.headers.get('location')).toMatch(/^\/signin\?next=/);
      });
    }
  }

  test('does keep support staff out of jobs, team and billing', async () => {
    for (const path of [
      '/api/jobs',
      '/app/jobs',
      '/app/billing',
      '/api/billing/portal',
      '/api/team/invitations',
    ]) {
      // 403 from the route table; 404 where that page has not been built yet. Never 200.
      const res = await call('support', 'GET', path);
      expect([403, 404], path).toContain(res.status);
    }
  });

  test('does answer an unknown flag id with 404, not an error', async () => {
    expect((await call('support', 'GET', '/api/support/flags/flg_nope')).status).toBe(404);
    expect((await call('support', 'GET', '/api/support/flags/flg_nope/rerun')).status).toBe(404);
    expect(
      (await call('support', 'POST', '/api/support/flags/flg_nope/notes', { body: 'x' })).status,
    ).toBe(404);
    expect((await call('support', 'GET', '/support/flags/flg_nope')).status).toBe(404);
  });
});

describe('the audit log', () => {
  const VIEWS: [Role, string, string][] = [
    ['support', '/api/support/flags', 'queue.view'],
    ['support', `/api/support/flags/${FLAG}`, 'flag.view'],
    ['support', `/support/flags/${FLAG}`, 'flag.view'],
    ['support', `/api/support/flags/${FLAG}/rerun`, 'flag.rerun'],
    ['admin', '/api/support/audit', 'audit.view'],
    ['admin', '/support/audit', 'audit.view'],
  ];
  for (const [role, path, action] of VIEWS) {
    test(`does record one ${action} entry for a view of ${path}`, async () => {
      const userId = USER_OF[role as Exclude<Role, 'anonymous'>];
      const before = auditCount(userId, action);
      expect((await call(role, 'GET', path)).status).toBe(200);
      expect(auditCount(userId, action)).toBe(before + 1);
    });
  }

  test('does record status changes and assignments with from and to', async () => {
    const before = auditCount(USER_OF.support, 'flag.assign');
    const res = await call('support', 'PATCH', `/api/support/flags/${FLAG}`, {
      status: 'waiting_on_reporter',
      assigneeUserId: USER_OF.support,
    });
    expect(res.status).toBe(200);
    expect(auditCount(USER_OF.support, 'flag.assign')).toBe(before + 1);
    const log = (await (
      await call('admin', 'GET', `/api/support/audit?flagId=${FLAG}`)
    ).json()) as {
      entries: { action: string; actorEmail: string; detail: { from?: string; to?: string } }[];
    };
    const status = log.entries.find((e) => e.action === 'flag.status');
    expect(status).toMatchObject({
      actorEmail: 'desk@drainwright.example',
      detail: { to: 'waiting_on_reporter' },
    });
  });

  test('does refuse assigning a flag to someone who is not staff', async () => {
    const res = await call('support', 'PATCH', `/api/support/flags/${FLAG}`, {
      assigneeUserId: USER_OF.member,
    });
    expect(res.status).toBe(400);
  });
});
