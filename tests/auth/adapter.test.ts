import { afterEach, describe, expect, test } from 'vitest';
import fs from 'node:fs';
import { drainwrightAdapter } from '../../src/lib/auth/adapter';
import { freshDb } from '../helpers/db';

let dir = '';
afterEach(() => fs.rmSync(dir, { recursive: true, force: true }));

function setup(): ReturnType<typeof freshDb> {
  const made = freshDb();
  dir = made.dir;
  return made;
}

const newUser = {
  id: 'usr_new_1',
  email: 'kai@riverbank.test',
  emailVerified: new Date('2026-12-02T10:00:00Z'),
  name: null,
};

describe('drainwrightAdapter.createUser', () => {
  test('does create the user, a personal free workspace and its owner membership together', async () => {
    const { db } = setup();
    const user = await drainwrightAdapter(db).createUser!(newUser);
    expect(user).toMatchObject({ id: 'usr_new_1', email: 'kai@riverbank.test' });
    const rows = db.$client
      .prepare(
        `select o.name, o.plan, o.personal, m.role from memberships m
         join organisations o on o.id = m.organisation_id where m.user_id = ?`,
      )
      .all('usr_new_1');
    expect(rows).toEqual([{ name: 'kai@riverbank.test', plan: 'free', personal: 1, role: 'owner' }]);
  });

  test('does leave no user behind when the workspace cannot be written', async () => {
    const { db } = setup();
    // A real failure inside SQLite at the second write of the three.
    db.$client.exec(
      `create trigger refuse_membership before insert on memberships
       begin select raise(abort, 'membership refused'); end;`,
    );
    await expect(drainwrightAdapter(db).createUser!(newUser)).rejects.toThrow('membership refused');
    const count = (table: string): unknown =>
      db.$client.prepare(`select count(*) as n from ${table}`).get();
    expect(count('users')).toEqual({ n: 0 });
    expect(count('organisations')).toEqual({ n: 0 });
  });
});
