import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { seedDemo } from '../../db/seed';
import { seedFlags } from '../../db/seed-flags';
import { auditEntries, flagSnapshots, flags } from '../../db/schema';
import type { Db } from '../../src/lib/db/client';
import { recordAudit } from '../../src/lib/flags/audit';
import { createFlag } from '../../src/lib/flags/create';
import { hashToken } from '../../src/lib/flags/ids';
import { newFlagSchema } from '../../src/lib/flags/schemas';
import { freshDb } from '../helpers/db';

const body = newFlagSchema.parse({
  tool: 'line',
  reason: 'looks_wrong',
  message: 'Flow looks too high',
  email: 'crew@example.org',
  snapshot: {
    inputs: {
      line: { inner_diameter_m: 0.025, length_m: 10, material: 'garden-hose' },
      source_level_m: 1,
      outlet_elevation_m: 0,
    },
    results: { flow_m3_s: 0.0012, engine_version: '1.0.0' },
    engineVersion: '1.0.0',
    unitSystem: 'us',
    page: '/gravity-line',
  },
});

describe('flag snapshots', () => {
  let db: Db;
  let flagId: string;
  let token: string;
  beforeAll(() => {
    db = freshDb().db;
    ({ id: flagId, token } = createFlag(db, body, {
      userId: null,
      email: 'Crew@Example.org',
      organisationId: null,
    }));
  });
  afterAll(() => db.$client.close());

  test('does keep exactly what was sent', () => {
    const s = db.select().from(flagSnapshots).where(eq(flagSnapshots.flagId, flagId)).get();
    expect(s?.inputs).toEqual(body.snapshot.inputs);
    expect(s?.results).toEqual(body.snapshot.results);
    expect(s?.unitSystem).toBe('us');
    expect(s?.page).toBe('/gravity-line');
  });

  test('does refuse an UPDATE of a snapshot, in SQL and through drizzle', () => {
    expect(() =>
      db.$client.prepare("UPDATE flag_snapshots SET results = '{}' WHERE flag_id = ?").run(flagId),
    ).toThrow(/immutable/);
    expect(() =>
      db
        .update(flagSnapshots)
        .set({ engineVersion: '9.9.9' })
        .where(eq(flagSnapshots.flagId, flagId))
        .run(),
    ).toThrow(/immutable/);
    const s = db.select().from(flagSnapshots).where(eq(flagSnapshots.flagId, flagId)).get();
    expect(s?.engineVersion).toBe('1.0.0');
  });

  test('does refuse deleting a snapshot', () => {
    expect(() =>
      db.$client.prepare('DELETE FROM flag_snapshots WHERE flag_id = ?').run(flagId),
    ).toThrow(/immutable/);
    expect(db.select().from(flagSnapshots).all()).toHaveLength(1);
  });

  test('does still let the flag itself move along', () => {
    db.update(flags).set({ status: 'in_hand' }).where(eq(flags.id, flagId)).run();
    expect(db.select().from(flags).where(eq(flags.id, flagId)).get()?.status).toBe('in_hand');
  });

  test('does store the address in lower case and only a hash of the view token', () => {
    const f = db.select().from(flags).where(eq(flags.id, flagId)).get();
    expect(f?.reporterEmail).toBe('crew@example.org');
    expect(f?.viewTokenHash).toBe(hashToken(token));
    expect(f?.viewTokenHash).not.toContain(token);
    expect(token).toMatch(/^[\w-]{43}$/);
  });
});

describe('audit entries', () => {
  test('does refuse edits and deletes', () => {
    const { db } = freshDb();
    seedDemo(db);
    recordAudit(
      db,
      { id: 'usr_demo_support', email: 'desk@drainwright.example', staffRole: 'support' },
      'queue.view',
      null,
    );
    expect(() => db.update(auditEntries).set({ action: 'nothing' }).run()).toThrow(/append-only/);
    expect(() => db.delete(auditEntries).run()).toThrow(/append-only/);
    expect(db.select().from(auditEntries).all()).toHaveLength(1);
    db.$client.close();
  });
});

describe('seedFlags', () => {
  test('does add the demo flags once, however often it runs', () => {
    const { db } = freshDb();
    seedDemo(db);
    seedFlags(db);
    seedFlags(db);
    const rows = db.select().from(flags).all();
    expect(rows.map((r) => r.id).sort()).toEqual(['flg_demo_garden_pond', 'flg_demo_tank_wall']);
    expect(db.select().from(flagSnapshots).all()).toHaveLength(2);
    db.$client.close();
  });
});
