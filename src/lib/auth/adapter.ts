/**
 * Auth.js's Drizzle adapter over our tables, with one change: creating a user also creates their
 * personal workspace in the same SQLite transaction. Done in Auth.js's createUser event instead,
 * a crash or error between the two writes would leave a user who belongs to no organisation and
 * cannot use the app.
 */
import { randomUUID } from 'node:crypto';
import type { Adapter, AdapterUser } from '@auth/core/adapters';
import { DrizzleAdapter } from '@auth/drizzle-adapter';
import { accounts, sessions, users, verificationTokens } from '../../../db/schema';
import type { Db } from '../db/client';
import { insertPersonalOrganisation } from '../data/organisations';

/** The adapter for `db`; createUser writes the user, their workspace and its membership at once. */
export function drainwrightAdapter(db: Db): Adapter {
  const base = DrizzleAdapter(db, {
    usersTable: users,
    accountsTable: accounts,
    sessionsTable: sessions,
    verificationTokensTable: verificationTokens,
  });
  return {
    ...base,
    createUser: async (data: AdapterUser): Promise<AdapterUser> =>
      db.transaction((tx) => {
        const user = tx
          .insert(users)
          .values({
            id: data.id || randomUUID(),
            name: data.name ?? null,
            email: data.email,
            emailVerified: data.emailVerified,
            image: data.image ?? null,
          })
          .returning()
          .get();
        insertPersonalOrganisation(tx, user.id, user.name || user.email || 'My workspace');
        return user;
      }),
  };
}
