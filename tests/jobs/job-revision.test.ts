import { beforeEach, describe, expect, test } from 'vitest';
import { seedDemo } from '../../db/seed';
import { setDb } from '../../src/lib/db/client';
import { createJob, getJob, updateJob } from '../../src/lib/data/jobs';
import { freshDb } from '../helpers/db';

// Real SQLite with the real migrations (0007 adds jobs.revision) and the demo seed.
const ORG = 'org_demo_heronsgate';
const OWNER = 'usr_demo_owner';

beforeEach(() => {
  const { db } = freshDb();
  seedDemo(db);
  setDb(db);
});

describe('updateJob revision check', () => {
  test('does start a new job and every seeded job at revision 1', () => {
    expect(createJob(ORG, OWNER, { title: 'New' }).revision).toBe(1);
    expect(getJob(ORG, 'job_demo_basement')?.revision).toBe(1);
  });

  test('does save at the loaded revision and bump it by one', () => {
    const r = updateJob(ORG, 'job_demo_basement', OWNER, { notes: 'gate code 4471' }, 1);
    expect(r.kind).toBe('saved');
    expect(getJob(ORG, 'job_demo_basement')).toMatchObject({ notes: 'gate code 4471', revision: 2 });
  });

  test('does refuse a stale revision, change nothing and hand back the newer job', () => {
    updateJob(ORG, 'job_demo_basement', OWNER, { notes: 'TAB A: gate code 4471' }, 1);
    const stale = updateJob(ORG, 'job_demo_basement', OWNER, { siteAddress: 'B', notes: 'old' }, 1);
    expect(stale).toMatchObject({ kind: 'stale', current: { notes: 'TAB A: gate code 4471', revision: 2 } });
    expect(getJob(ORG, 'job_demo_basement')).toMatchObject({ notes: 'TAB A: gate code 4471', revision: 2 });
  });

  test('does save deliberately over the newer job when given its revision', () => {
    updateJob(ORG, 'job_demo_basement', OWNER, { notes: 'A' }, 1);
    expect(updateJob(ORG, 'job_demo_basement', OWNER, { notes: 'B' }, 2).kind).toBe('saved');
    expect(getJob(ORG, 'job_demo_basement')).toMatchObject({ notes: 'B', revision: 3 });
  });

  test("does answer missing for another organisation's job and leave it alone", () => {
    expect(updateJob('org_demo_lee', 'job_demo_basement', OWNER, { notes: 'x' }, 1).kind).toBe('missing');
    expect(getJob(ORG, 'job_demo_basement')?.revision).toBe(1);
  });
});
