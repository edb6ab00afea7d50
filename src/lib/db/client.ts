import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { drizzle } from 'drizzle-orm/better-sqlite3';
import type { BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import * as schema from '../../../db/schema';
import { getConfig } from '../config';
import { runMigrations } from './migrate';

export type Db = BetterSQLite3Database<typeof schema> & { $client: Database.Database };

/**
 * Open a SQLite database with the settings every connection needs: write-ahead logging so readers
 * never block the writer, foreign keys enforced, and a busy timeout so concurrent writers wait
 * instead of failing with SQLITE_BUSY.
 */
export function openDatabase(file: string): Db {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(file), { recursive: true });
  const sqlite = new Database(file);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  sqlite.pragma('synchronous = NORMAL');
  return drizzle(sqlite, { schema }) as Db;
}

let shared: Db | undefined;

/**
 * The app's one shared connection, opened on first use at DATA_DIR/drainwright.sqlite. Pending
 * migrations are applied on open, so a server started without the start command is never behind.
 */
export function getDb(): Db {
  if (!shared) {
    const db = openDatabase(getConfig().databaseFile);
    runMigrations(db);
    shared = db;
    // Checkpoint the WAL and release the file however the process ends (graceful shutdown).
    process.once('exit', closeDb);
  }
  return shared;
}

/** Close the shared connection (graceful shutdown, tests). */
export function closeDb(): void {
  shared?.$client.close();
  shared = undefined;
}

/** Use a given connection as the shared one (tests on a fresh database). */
export function setDb(db: Db): void {
  shared = db;
}
