import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import type { Db } from './client';

/** Folder of the committed drizzle-kit migrations, found from this file or the working dir. */
export function migrationsFolder(): string {
  const fromEnv = process.env.DRAINWRIGHT_MIGRATIONS;
  if (fromEnv) return fromEnv;
  // In the built server this module is bundled under dist/, so fall back to the project root.
  const here = path.dirname(fileURLToPath(import.meta.url));
  const candidates = [path.resolve(here, '../../../db/migrations'), path.resolve('db/migrations')];
  return candidates.find((dir) => dirExists(dir)) ?? candidates[1];
}

function dirExists(dir: string): boolean {
  try {
    return fs.statSync(dir).isDirectory();
  } catch {
    return false;
  }
}

/** Apply every pending migration; applying twice changes nothing. */
export function runMigrations(db: Db): void {
  migrate(db, { migrationsFolder: migrationsFolder() });
}
