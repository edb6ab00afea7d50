import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { and, asc, eq, gt, isNull } from 'drizzle-orm';
import { invitations, organisations } from '../../../db/schema';
import { seatLimit } from '../billing/seats';
import { getDb } from '../db/client';
import { TeamError, addMember, countMembers, listMembers } from './memberships';
import type { Role } from './memberships';

/** How long an invitation link works. */
export const INVITE_DAYS = 7;

export interface PendingInvitation {
  id: string;
  email: string;
  role: Role;
  createdAt: Date;
  expiresAt: Date;
}

export type InvitationState = 'open' | 'expired' | 'used' | 'withdrawn' | 'unknown';

export interface InvitationLookup {
  state: InvitationState;
  id?: string;
  organisationId?: string;
  organisationName?: string;
  email?: string;
  role?: Role;
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

const open = (now: Date) => and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, now));

/** Open invitations of one organisation, oldest first. */
export function listPendingInvitations(orgId: string, now = new Date()): PendingInvitation[] {
  return getDb()
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, createdAt: invitations.createdAt, expiresAt: invitations.expiresAt })
    .from(invitations)
    .where(and(eq(invitations.organisationId, orgId), open(now)))
    .orderBy(asc(invitations.createdAt))
    .all();
}

/** Seats in use: members plus open invitations. */
export function seatsInUse(orgId: string, now = new Date()): number {
  return countMembers(orgId) + listPendingInvitations(orgId, now).length;
}

/**
 * Invite someone by e-mail. Asking again for the same address withdraws the earlier link.
 * Returns the id and the link token (only ever held in memory and the e-mail).
 */
export function createInvitation(
  orgId: string,
  input: { email: string; role: Role; invitedBy: string },
  now = new Date(),
): { id: string; token: string; expiresAt: Date } {
  const email = input.email.trim().toLowerCase();
  if (listMembers(orgId).some((m) => m.email.toLowerCase() === email)) {
    throw new TeamError('already_member', `${email} is already in this organisation.`);
  }
  const token = randomBytes(32).toString('base64url');
  const id = `inv_${randomUUID()}`;
  const expiresAt = new Date(now.getTime() + INVITE_DAYS * 86_400_000);
  // Withdrawing the earlier link and issuing the new one are one write: a refusal (seats) or a
  // crash between them must not leave the address with no working link.
  getDb().transaction((tx) => {
    const again = listPendingInvitations(orgId, now).find((i) => i.email === email);
    if (again) revokeInvitation(orgId, again.id, now);
    if (seatsInUse(orgId, now) >= seatLimit(orgId)) {
      throw new TeamError('seat_limit', `All ${seatLimit(orgId)} seats are taken. Remove someone or add seats first.`);
    }
    tx.insert(invitations)
      .values({ id, organisationId: orgId, email, role: input.role, tokenHash: hashToken(token), invitedBy: input.invitedBy, createdAt: now, expiresAt })
      .run();
  });
  return { id, token, expiresAt };
}

/** Withdraw an open invitation of this organisation; another organisation's id is not found. */
export function revokeInvitation(orgId: string, id: string, now = new Date()): void {
  const result = getDb()
    .update(invitations)
    .set({ revokedAt: now })
    .where(and(eq(invitations.id, id), eq(invitations.organisationId, orgId), open(now)))
    .run();
  if (result.changes !== 1) throw new TeamError('not_found', 'No open invitation with that id.');
}

/** What a link's token refers to, and whether it can still be used. */
export function lookupInvitation(token: string, now = new Date()): InvitationLookup {
  const row = getDb()
    .select({ inv: invitations, orgName: organisations.name })
    .from(invitations)
    .innerJoin(organisations, eq(organisations.id, invitations.organisationId))
    .where(eq(invitations.tokenHash, hashToken(token)))
    .get();
  if (!row) return { state: 'unknown' };
  const { inv } = row;
  const state: InvitationState = inv.acceptedAt ? 'used' : inv.revokedAt ? 'withdrawn' : inv.expiresAt <= now ? 'expired' : 'open';
  return { state, id: inv.id, organisationId: inv.organisationId, organisationName: row.orgName, email: inv.email, role: inv.role };
}

/**
 * Accept an invitation as a signed-in user whose e-mail it was sent to. Marking it used and adding
 * the membership happen in one transaction, and the mark only lands on an open invitation, so a
 * link works once even when opened twice at the same moment.
 */
export function acceptInvitation(token: string, user: { id: string; email: string }, now = new Date()): string {
  const found = lookupInvitation(token, now);
  if (found.state !== 'open' || !found.id || !found.organisationId) {
    throw new TeamError('invalid', invitationProblem(found.state));
  }
  if (found.email !== user.email.toLowerCase()) {
    throw new TeamError('invalid', `This invitation is for ${found.email}. Sign in with that address to accept it.`);
  }
  const orgId = found.organisationId;
  getDb().transaction((tx) => {
    const marked = tx
      .update(invitations)
      .set({ acceptedAt: now, acceptedBy: user.id })
      .where(and(eq(invitations.id, found.id!), open(now)))
      .run();
    if (marked.changes !== 1) throw new TeamError('invalid', invitationProblem('used'));
    addMember(orgId, user.id, found.role ?? 'member');
  });
  return orgId;
}

/** Words for an invitation that cannot be used. */
export function invitationProblem(state: InvitationState): string {
  switch (state) {
    case 'expired':
      return 'This invitation has expired. Ask the owner to send a new one.';
    case 'used':
      return 'This invitation has already been used.';
    case 'withdrawn':
      return 'This invitation was withdrawn by the owner.';
    default:
      return 'This invitation link is not valid.';
  }
}
