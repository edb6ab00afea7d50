import { count } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import { calculations, jobs, memberships, organisations, users } from '../../db/schema';
import { seedDemo } from '../../db/seed';
import { openDatabase } from '../../src/lib/db/client';
import { runMigrations } from '../../src/lib/db/migrate';
import { prepareDatabase } from '../../src/lib/db/setup';
import { freshDb } from '../helpers/db';

function schemaDump(db: ReturnType<typeof freshDb>['db']): string {
  const rows = db.$client
    .prepare("SELECT type, name, sql FROM sqlite_master WHERE name NOT LIKE 'sqlite_%' ORDER BY name")
    .all();
  return JSON.stringify(rows);
}

function counts(db: ReturnType<typeof freshDb>['db']): number[] {
  return [users, organisations, memberships, jobs, calculations].map((t) => db.select({ n: count() }).from(t).all()[0].n);
}

describe('migrations', () => {
  test('apply to an empty database and create every table', () => {
    const { db } = freshDb();
    const tables = db.$client.prepare("SELECT name FROM sqlite_master WHERE type = 'table'").all() as { name: string }[];
    const names = tables.map((t) => t.name);
    for (const t of ['users', 'organisations', 'memberships', 'jobs', 'calculations', 'sessions']) {
      expect(names).toContain(t);
    }
  });

  test('change nothing when run again', () => {
    const { db } = freshDb();
    const before = schemaDump(db);
    const applied = db.$client.prepare('SELECT count(*) AS n FROM __drizzle_migrations').get();
    runMigrations(db);
    expect(schemaDump(db)).toBe(before);
    expect(db.$client.prepare('SELECT count(*) AS n FROM __drizzle_migrations').get()).toEqual(applied);
  });

  test('open connections with WAL, foreign keys and a busy timeout', () => {
    const { db } = freshDb();
    expect(db.$client.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(db.$client.pragma('foreign_keys', { simple: true })).toBe(1);
    expect(db.$client.pragma('busy_timeout', { simple: true })).toBeGreaterThanOrEqual(1000);
  });
});

describe('demo seed', () => {
  test('creates the firm, its crew, support staff and a free user', () => {
    const { db } = freshDb();
    seedDemo(db);
    const [nUsers, nOrgs, nMemberships, nJobs] = counts(db);
    expect(nUsers).toBe(5);
    expect(nOrgs).toBe(2);
    expect(nMemberships).toBe(4);
    expect(nJobs).toBeGreaterThanOrEqual(3);
    const calcs = db.select().from(calculations).all();
    expect(calcs.map((c) => c.tool).sort()).toEqual(['drain', 'line', 'siphon']);
    // The seed stores what the engine answered, so a saved demo job opens with real results.
    expect(calcs.every((c) => typeof (c.results as { status?: string }).status === 'string')).toBe(true);
    const staff = db.select().from(users).all().filter((u) => u.staffRole === 'support');
    expect(staff).toHaveLength(1);
  });

  test('is idempotent', () => {
    const { db } = freshDb();
    seedDemo(db);
    const first = counts(db);
    seedDemo(db);
    expect(counts(db)).toEqual(first);
  });

  test('runs only on first start', () => {
    const { file } = freshDb();
    const db = openDatabase(file);
    expect(prepareDatabase(db)).toEqual({ seeded: true });
    expect(prepareDatabase(db)).toEqual({ seeded: false });
  });

  test('foreign keys reject a membership of a missing user', () => {
    const { db } = freshDb();
    seedDemo(db);
    expect(() =>
      db.insert(memberships).values({ organisationId: 'org_demo_heronsgate', userId: 'nobody', role: 'member' }).run(),
    ).toThrow(/FOREIGN KEY/);
  });
});
