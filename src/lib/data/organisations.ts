import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { memberships, organisations } from '../../../db/schema';
import { getDb } from '../db/client';
import type { Db } from '../db/client';

export interface OrganisationView {
  id: string;
  name: string;
  plan: 'free' | 'pro';
  personal: boolean;
}

/** One organisation by id, or null. */
export function getOrganisation(orgId: string): OrganisationView | null {
  const row = getDb()
    .select({
      id: organisations.id,
      name: organisations.name,
      plan: organisations.plan,
      personal: organisations.personal,
    })
    .from(organisations)
    .where(eq(organisations.id, orgId))
    .get();
  return row ?? null;
}

/**
 * Give a new user their own free workspace, with them as its owner: the organisation and the
 * membership rows, written through `tx` so they land with the user row or not at all (see
 * src/lib/auth/adapter.ts).
 */
export function insertPersonalOrganisation(
  tx: Pick<Db, 'insert'>,
  userId: string,
  name: string,
): string {
  const id = `org_${randomUUID()}`;
  tx.insert(organisations).values({ id, name, plan: 'free', personal: true }).run();
  tx.insert(memberships).values({ organisationId: id, userId, role: 'owner' }).run();
  return id;
}

/** Rename an organisation (owner action). */
export function renameOrganisation(orgId: string, name: string): void {
  getDb().update(organisations).set({ name }).where(eq(organisations.id, orgId)).run();
}
