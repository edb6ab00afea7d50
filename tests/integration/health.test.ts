import fs from 'node:fs';
import { describe, expect, test } from 'vitest';
import { openDatabase } from '../../src/lib/db/client';
import { checkHealth } from '../../src/lib/health';
import { freshDb } from '../helpers/db';

describe('checkHealth', () => {
  test('reports ok after a real query on a migrated database', () => {
    const { db } = freshDb();
    expect(checkHealth(() => db)).toEqual({ status: 'ok', version: expect.any(String) });
  });

  test('reports unavailable when the database connection is closed', () => {
    const { db } = freshDb();
    db.$client.close();
    const health = checkHealth(() => db);
    expect(health.status).toBe('unavailable');
  });

  test('reports unavailable when the database cannot be opened', () => {
    const { dir } = freshDb();
    fs.rmSync(dir, { recursive: true, force: true });
    fs.writeFileSync(dir, 'not a folder');
    const health = checkHealth(() => openDatabase(`${dir}/x/test.sqlite`));
    expect(health).toMatchObject({ status: 'unavailable', reason: expect.any(String) });
  });

  test('reports unavailable on an empty, unmigrated database', () => {
    const { dir } = freshDb();
    const health = checkHealth(() => openDatabase(`${dir}/empty.sqlite`));
    expect(health.status).toBe('unavailable');
  });
});
