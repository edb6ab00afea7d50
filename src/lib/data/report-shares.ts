import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import { reportShares } from '../../../db/schema';
import { getDb } from '../db/client';

export type ShareRow = typeof reportShares.$inferSelect;
/** A share as the owner sees it: never the token (only its creator's answer carries it). */
export type ShareView = Omit<ShareRow, 'tokenHash'>;

const DAY_MS = 86_400_000;

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

function view({ tokenHash: _omit, ...rest }: ShareRow): ShareView {
  return rest;
}

/** Make a read-only report link that expires after `days`; the token is returned once. */
export function createShare(
  orgId: string,
  jobId: string,
  userId: string | null,
  days: number,
): { share: ShareView; token: string } {
  const token = randomBytes(32).toString('base64url');
  const now = Date.now();
  const row: ShareRow = {
    id: `shr_${randomUUID()}`,
    tokenHash: hashToken(token),
    jobId,
    organisationId: orgId,
    createdBy: userId,
    createdAt: new Date(now),
    expiresAt: new Date(now + days * DAY_MS),
    revokedAt: null,
  };
  getDb().insert(reportShares).values(row).run();
  return { share: view(row), token };
}

/** A job's report links, newest first. */
export function listShares(orgId: string, jobId: string): ShareView[] {
  return getDb()
    .select()
    .from(reportShares)
    .where(and(eq(reportShares.organisationId, orgId), eq(reportShares.jobId, jobId)))
    .orderBy(desc(reportShares.createdAt))
    .all()
    .map(view);
}

/** Revoke a link now; false when it is not this organisation's job's. */
export function revokeShare(orgId: string, jobId: string, shareId: string): boolean {
  const res = getDb()
    .update(reportShares)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(reportShares.organisationId, orgId),
        eq(reportShares.jobId, jobId),
        eq(reportShares.id, shareId),
        isNull(reportShares.revokedAt),
      ),
    )
    .run();
  return res.changes > 0;
}

/** The live (unrevoked, unexpired) share for a token, or null. */
export function findLiveShare(token: string): ShareRow | null {
  if (!/^[\w-]{20,100}$/.test(token)) return null;
  return (
    getDb()
      .select()
      .from(reportShares)
      .where(
        and(
          eq(reportShares.tokenHash, hashToken(token)),
          isNull(reportShares.revokedAt),
          gt(reportShares.expiresAt, new Date()),
        ),
      )
      .get() ?? null
  );
}
