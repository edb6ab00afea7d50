import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';

/** Where backups go: DATA_DIR/backups. */
export function backupsDir(dataDir: string): string {
  return path.join(dataDir, 'backups');
}

/**
 * Copy the live database through SQLite's online backup API, which gives a consistent snapshot
 * while the server keeps reading and writing. Returns the backup file's path.
 */
export async function backupDatabase(databaseFile: string, dataDir: string, now = new Date()): Promise<string> {
  if (!fs.existsSync(databaseFile)) throw new Error(`no database at ${databaseFile}`);
  const dir = backupsDir(dataDir);
  fs.mkdirSync(dir, { recursive: true });
  const stamp = now.toISOString().replace(/[:.]/g, '-');
  const target = path.join(dir, `drainwright-${stamp}.sqlite`);
  const source = new Database(databaseFile, { fileMustExist: true });
  try {
    source.pragma('busy_timeout = 5000');
    await source.backup(target);
  } finally {
    source.close();
  }
  assertIntact(target);
  return target;
}

/** Throw unless the file is a SQLite database that passes PRAGMA integrity_check. */
export function assertIntact(file: string): void {
  let db: Database.Database;
  try {
    db = new Database(file, { readonly: true, fileMustExist: true });
  } catch {
    throw new Error(`${file} is not a readable SQLite database`);
  }
  try {
    const result = db.pragma('integrity_check', { simple: true });
    if (result !== 'ok') throw new Error(`${file} failed its integrity check: ${String(result)}`);
  } catch (error) {
    throw error instanceof Error && error.message.includes('integrity') ? error : new Error(`${file} is not a valid SQLite database`);
  } finally {
    db.close();
  }
}

/**
 * Replace the database with a backup. Run with the server stopped: the backup is checked first,
 * the current file is kept beside it as `.before-restore`, and stale WAL files are removed.
 */
export function restoreDatabase(backupFile: string, databaseFile: string): void {
  assertIntact(backupFile);
  fs.mkdirSync(path.dirname(databaseFile), { recursive: true });
  if (fs.existsSync(databaseFile)) fs.copyFileSync(databaseFile, `${databaseFile}.before-restore`);
  for (const suffix of ['-wal', '-shm']) fs.rmSync(`${databaseFile}${suffix}`, { force: true });
  fs.copyFileSync(backupFile, databaseFile);
}
