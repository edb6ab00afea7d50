import { and, asc, count, eq } from 'drizzle-orm';
import { memberships, organisations, users } from '../../../db/schema';
import { getDb } from '../db/client';

export type Role = 'owner' | 'member';

export interface MembershipView {
  organisation: { id: string; name: string; plan: 'free' | 'pro'; personal: boolean };
  role: Role;
}

export interface MemberRow {
  userId: string;
  email: string;
  name: string | null;
  role: Role;
  joinedAt: Date;
}

/** Every organisation a user belongs to, oldest membership first. */
export function membershipsForUser(userId: string): MembershipView[] {
  return getDb()
    .select({
      id: organisations.id,
      name: organisations.name,
      plan: organisations.plan,
      personal: organisations.personal,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(organisations, eq(organisations.id, memberships.organisationId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(memberships.createdAt))
    .all()
    .map(({ role, ...organisation }) => ({ organisation, role }));
}

/** The members of one organisation, owners first. */
export function listMembers(orgId: string): MemberRow[] {
  return getDb()
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.organisationId, orgId))
    .orderBy(asc(memberships.role), asc(users.email))
    .all();
}

/** One member of an organisation, or null when that user is not in it. */
export function findMember(orgId: string, userId: string): MemberRow | null {
  return listMembers(orgId).find((m) => m.userId === userId) ?? null;
}

export function countMembers(orgId: string): number {
  const [row] = getDb()
    .select({ n: count() })
    .from(memberships)
    .where(eq(memberships.organisationId, orgId))
    .all();
  return row?.n ?? 0;
}

function countOwners(orgId: string): number {
  const [row] = getDb()
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.organisationId, orgId), eq(memberships.role, 'owner')))
    .all();
  return row?.n ?? 0;
}

/** Why a change to the team was refused, in words for the owner. */
export class TeamError extends Error {
  constructor(
    readonly code: 'not_found' | 'last_owner' | 'seat_limit' | 'already_member' | 'invalid',
    message: string,
  ) {
    super(message);
  }
}

/** Change a member's role; an organisation always keeps at least one owner. */
export function changeRole(orgId: string, userId: string, role: Role): void {
  const member = findMember(orgId, userId);
  if (!member) throw new TeamError('not_found', 'No such member in this organisation.');
  if (member.role === 'owner' && role !== 'owner' && countOwners(orgId) <= 1) {
    throw new TeamError('last_owner', 'The organisation needs at least one owner.');
  }
  getDb()
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.organisationId, orgId), eq(memberships.userId, userId)))
    .run();
}

/** Remove a member; the last owner cannot be removed. Their work stays with the organisation. */
export function removeMember(orgId: string, userId: string): void {
  const member = findMember(orgId, userId);
  if (!member) throw new TeamError('not_found', 'No such member in this organisation.');
  if (member.role === 'owner' && countOwners(orgId) <= 1) {
    throw new TeamError('last_owner', 'The last owner cannot be removed.');
  }
  getDb()
    .delete(memberships)
    .where(and(eq(memberships.organisationId, orgId), eq(memberships.userId, userId)))
    .run();
}

/** Add a user to an organisation (invitation accepted); nothing happens if already a member. */
export function addMember(orgId: string, userId: string, role: Role): void {
  getDb()
    .insert(memberships)
    .values({ organisationId: orgId, userId, role })
    .onConflictDoNothing()
    .run();
}
