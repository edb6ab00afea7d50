import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startJobsApp } from './app-fixture';
import type { JobsApp } from './app-fixture';

let t: JobsApp;
const OWNER = 'usr_demo_owner';
const json = { 'content-type': 'application/json' };

beforeAll(async () => {
  t = await startJobsApp(16798);
}, 120_000);
afterAll(async () => {
  t?.db.close();
  await t?.app.stop();
});

const call = (path: string, user: string | null, init: { method?: string; body?: unknown } = {}): Promise<Response> =>
  fetch(`${t.app.url}${path}`, {
    method: init.method ?? 'GET',
    headers: { ...(user ? t.as(user) : {}), ...(init.body !== undefined ? json : {}) },
    body: init.body !== undefined ? JSON.stringify(init.body) : undefined,
  });

// Demo request of db/seed-calculations.ts (invented); the test checks storage, not the numbers.
const LINE = { line: { inner_diameter_m: 0.0508, length_m: 25, material: 'layflat-hose' }, source_level_m: 0.3, outlet_elevation_m: -2.4 };

describe('GET/POST /api/jobs', () => {
  test('does list the seeded jobs, searched, filtered and paged', async () => {
    const all = await (await call('/api/jobs', OWNER)).json();
    expect(all.total).toBeGreaterThanOrEqual(3);
    const found = await (await call('/api/jobs?q=koi', OWNER)).json();
    expect(found.items.map((j: { id: string }) => j.id)).toEqual(['job_demo_koi']);
    const quoted = await (await call('/api/jobs?status=quoted', OWNER)).json();
    expect(quoted.items.every((j: { status: string }) => j.status === 'quoted')).toBe(true);
    const paged = await (await call('/api/jobs?pageSize=1&page=2&sort=title', OWNER)).json();
    expect(paged.items).toHaveLength(1);
  });

  test('does refuse bad queries and bodies with 400 naming the field', async () => {
    expect((await call('/api/jobs?sort=bogus', OWNER)).status).toBe(400);
    const r = await call('/api/jobs', OWNER, { method: 'POST', body: { title: '' } });
    expect(r.status).toBe(400);
    expect((await r.json()).issues[0].path).toBe('title');
    expect((await call('/api/jobs', OWNER, { method: 'POST', body: { title: 'x', extra: 1 } })).status).toBe(400);
  });

  test('does answer 401 signed out and 403 to a free workspace', async () => {
    expect((await call('/api/jobs', null)).status).toBe(401);
    expect((await call('/api/jobs', 'usr_demo_free')).status).toBe(403);
  });
});

describe('calculations', () => {
  test('does store the engine result, not the client one, and refuse inputs the engine rejects', async () => {
    const job = (await (await call('/api/jobs', OWNER, { method: 'POST', body: { title: 'Calc test' } })).json()).job;
    const faked = await call(`/api/jobs/${job.id}/calculations`, OWNER, { method: 'POST', body: { tool: 'line', inputs: LINE, unitSystem: 'metric', results: { flow_m3_s: 99 } } });
    expect(faked.status).toBe(400);
    const bad = await call(`/api/jobs/${job.id}/calculations`, OWNER, { method: 'POST', body: { tool: 'line', inputs: { ...LINE, line: { ...LINE.line, material: 'cheese' } }, unitSystem: 'metric' } });
    expect((await bad.json()).issues[0].path).toBe('inputs.line.material');
    const ok = await call(`/api/jobs/${job.id}/calculations`, OWNER, { method: 'POST', body: { tool: 'line', inputs: LINE, unitSystem: 'metric' } });
    expect(ok.status).toBe(201);
    const calc = (await ok.json()).calculation;
    expect(calc.results.flow_m3_s).toBeGreaterThan(0);
    const rerun = await (await call(`/api/jobs/${job.id}/calculations/${calc.id}?rerun=1`, OWNER)).json();
    expect(rerun.rerun.changes).toEqual([]);
    expect((await call(`/api/jobs/${job.id}/calculations/${calc.id}`, OWNER, { method: 'DELETE' })).status).toBe(204);
  });
});

describe('PATCH /api/jobs/:id revision check (QA s23 H3: two tabs)', () => {
  test('does save at the loaded revision, then refuse the stale tab with 409 and keep the first edit', async () => {
    const job = (await (await call('/api/jobs', OWNER, { method: 'POST', body: { title: 'Two tabs', notes: 'old' } })).json()).job;
    expect(job.revision).toBe(1);
    const a = await call(`/api/jobs/${job.id}`, OWNER, { method: 'PATCH', body: { notes: 'TAB A: gate code 4471', revision: 1 } });
    expect(a.status).toBe(200);
    expect((await a.json()).job.revision).toBe(2);
    const b = await call(`/api/jobs/${job.id}`, OWNER, { method: 'PATCH', body: { siteAddress: 'B', notes: 'old', revision: 1 } });
    expect(b.status).toBe(409);
    const conflict = await b.json();
    expect(conflict).toMatchObject({ error: 'edit_conflict', job: { notes: 'TAB A: gate code 4471', revision: 2 } });
    expect(conflict.message).toMatch(/saved this job after you opened it/);
    const now = (await (await call(`/api/jobs/${job.id}`, OWNER)).json()).job;
    expect(now).toMatchObject({ notes: 'TAB A: gate code 4471', siteAddress: '', revision: 2 });
    const over = await call(`/api/jobs/${job.id}`, OWNER, { method: 'PATCH', body: { siteAddress: 'B', revision: 2 } });
    expect((await over.json()).job).toMatchObject({ siteAddress: 'B', notes: 'TAB A: gate code 4471', revision: 3 });
  });

  test('does refuse an edit without a usable revision with 400 naming the field', async () => {
    for (const revision of [undefined, 'one', 1.5, 0]) {
      const r = await call('/api/jobs/job_demo_koi', OWNER, { method: 'PATCH', body: { title: 'x', revision } });
      expect(r.status, String(revision)).toBe(400);
      expect((await r.json()).issues[0].path).toBe('revision');
    }
    const only = await call('/api/jobs/job_demo_koi', OWNER, { method: 'PATCH', body: { revision: 1 } });
    expect(only.status).toBe(400);
  });
});

describe('organisation scoping', () => {
  test("does answer 404 for another organisation's job on every route", async () => {
    expect((await call('/api/jobs/job_t_other', OWNER)).status).toBe(404);
    expect((await call('/api/jobs/job_t_other', OWNER, { method: 'PATCH', body: { title: 'mine' } })).status).toBe(404);
    expect((await call('/api/jobs/job_t_other', OWNER, { method: 'DELETE' })).status).toBe(404);
    expect((await call('/api/jobs/job_t_other/calculations', OWNER, { method: 'POST', body: { tool: 'line', inputs: LINE, unitSystem: 'metric' } })).status).toBe(404);
    expect((await call('/api/jobs/job_demo_koi/calculations/calc_demo_koi', 'usr_t_other')).status).toBe(404);
    expect((await call('/api/jobs/job_demo_koi/calculations/calc_demo_koi', 'usr_t_other', { method: 'DELETE' })).status).toBe(404);
    expect((await call('/app/jobs/job_demo_koi/report.pdf', 'usr_t_other')).status).toBe(404);
    const theirs = await (await call('/api/jobs/export?format=json', 'usr_t_other')).json();
    expect(theirs.jobs.map((j: { id: string }) => j.id)).toEqual(['job_t_other']);
  });
});

describe('read-only (lapsed subscription)', () => {
  const RO = 'usr_t_lapsed';
  test('does read and export but not write', async () => {
    expect((await call('/api/jobs/job_t_lapsed', RO)).status).toBe(200);
    const csv = await call('/api/jobs/export?format=csv', RO);
    expect(csv.status).toBe(200);
    expect(await csv.text()).toContain('job_t_lapsed');
    expect((await call('/app/jobs/job_t_lapsed/report.pdf', RO)).status).toBe(200);
    for (const [path, method, body] of [
      ['/api/jobs', 'POST', { title: 'new' }],
      ['/api/jobs/job_t_lapsed', 'PATCH', { title: 'changed' }],
      ['/api/jobs/job_t_lapsed', 'DELETE', undefined],
      ['/api/jobs/job_t_lapsed/calculations', 'POST', { tool: 'line', inputs: LINE, unitSystem: 'metric' }],
      ['/api/jobs/job_t_lapsed/shares', 'POST', { days: 5 }],
    ] as const) {
      const r = await call(path, RO, { method, body });
      expect(r.status, `${method} ${path}`).toBe(403);
      expect((await r.json()).error).toBe('read_only');
    }
  });
});

describe('report links', () => {
  test('does open while live and stop after revocation', async () => {
    const made = await (await call('/api/jobs/job_demo_tank/shares', OWNER, { method: 'POST', body: { days: 7 } })).json();
    const page = await fetch(made.url);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('calc_demo_tank');
    expect((await call(`/api/jobs/job_demo_tank/shares/${made.share.id}`, OWNER, { method: 'DELETE' })).status).toBe(204);
    expect((await fetch(made.url)).status).toBe(404);
    expect((await fetch(`${t.app.url}/r/not-a-real-token-aaaaaaaaaaaaaa`)).status).toBe(404);
  });
});
