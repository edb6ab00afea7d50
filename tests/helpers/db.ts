import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { openDatabase } from '../../src/lib/db/client';
import type { Db } from '../../src/lib/db/client';
import { runMigrations } from '../../src/lib/db/migrate';

/** A fresh SQLite file in a temp folder with the real migrations applied. */
export function freshDb(): { db: Db; file: string; dir: string } {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'dw-db-'));
  const file = path.join(dir, 'test.sqlite');
  const db = openDatabase(file);
  runMigrations(db);
  return { db, file, dir };
}
