import { count } from 'drizzle-orm';
import { users } from '../../../db/schema';
import { seedDemo } from '../../../db/seed';
import type { Db } from './client';
import { runMigrations } from './migrate';

/** Migrate, and seed the demo scenario when the database has no users yet. */
export function prepareDatabase(db: Db): { seeded: boolean } {
  runMigrations(db);
  const [row] = db.select({ n: count() }).from(users).all();
  if ((row?.n ?? 0) > 0) return { seeded: false };
  seedDemo(db);
  return { seeded: true };
}
