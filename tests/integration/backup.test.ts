import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { jobs } from '../../db/schema';
import { seedDemo } from '../../db/seed';
import { openDatabase } from '../../src/lib/db/client';
import { backupDatabase, restoreDatabase } from '../../src/lib/db/backup';
import { freshDb } from '../helpers/db';

describe('database backup and restore', () => {
  test('round-trips: a backup taken while the database is open restores what it held', async () => {
    const { db, file, dir } = freshDb();
    seedDemo(db);
    const before = db.select().from(jobs).all();
    const backup = await backupDatabase(file, dir);
    expect(path.dirname(backup)).toBe(path.join(dir, 'backups'));
    db.delete(jobs).run();
    db.$client.close();
    restoreDatabase(backup, file);
    const reopened = openDatabase(file);
    expect(reopened.select().from(jobs).all()).toEqual(before);
    expect(reopened.$client.pragma('integrity_check', { simple: true })).toBe('ok');
  });

  test('refuses to restore a file that is not a database and keeps the current one', () => {
    const { db, file, dir } = freshDb();
    seedDemo(db);
    db.$client.close();
    const junk = path.join(dir, 'junk.sqlite');
    fs.writeFileSync(junk, 'this is not sqlite');
    expect(() => restoreDatabase(junk, file)).toThrow(/not a (readable|valid) SQLite database/);
    expect(openDatabase(file).select().from(jobs).all().length).toBeGreaterThan(0);
  });

  test('the npm commands back up and restore DATA_DIR', () => {
    const { db, dir } = freshDb();
    db.$client.close();
    const dataDir = path.join(dir, 'data');
    const env = { ...process.env, DATA_DIR: dataDir };
    execFileSync('npm', ['run', '--silent', 'db:seed'], { env });
    const out = execFileSync('npm', ['run', '--silent', 'db:backup'], { env, encoding: 'utf8' });
    const backup = /Backup written: (.+)/.exec(out)?.[1]?.trim() ?? '';
    expect(fs.existsSync(backup)).toBe(true);
    const restored = execFileSync('npm', ['run', '--silent', 'db:restore', '--', backup], { env, encoding: 'utf8' });
    expect(restored).toContain('Restored');
  });
});
