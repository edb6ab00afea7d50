import { count, desc, eq } from 'drizzle-orm';
import { auditEntries } from '../../../db/schema';
import type { Db } from '../db/client';
import { newId } from './ids';

/** The staff member doing something at the desk. */
export interface StaffActor {
  id: string;
  email: string;
  staffRole: 'support' | 'admin' | null;
}

/** Everything a staff member can view or do; each lands in the audit log. */
export type AuditAction =
  | 'queue.view'
  | 'flag.view'
  | 'flag.rerun'
  | 'flag.note'
  | 'flag.reply'
  | 'flag.status'
  | 'flag.assign'
  | 'audit.view';

/** Append one entry to the audit log (on the connection or inside the caller's transaction). */
export function recordAudit(
  db: Pick<Db, 'insert'>,
  actor: StaffActor,
  action: AuditAction,
  flagId: string | null,
  detail: Record<string, unknown> | null = null,
): void {
  db.insert(auditEntries)
    .values({
      id: newId('aud'),
      actorUserId: actor.id,
      actorEmail: actor.email,
      action,
      flagId,
      detail,
      createdAt: new Date(),
    })
    .run();
}

export interface AuditRow {
  id: string;
  actorEmail: string;
  action: string;
  flagId: string | null;
  detail: unknown;
  createdAt: string;
}

/** A page of the audit log, newest first, optionally for one flag. */
export function listAudit(
  db: Db,
  q: { flagId?: string; page: number; perPage: number },
): { entries: AuditRow[]; total: number } {
  const where = q.flagId ? eq(auditEntries.flagId, q.flagId) : undefined;
  const rows = db
    .select()
    .from(auditEntries)
    .where(where)
    .orderBy(desc(auditEntries.createdAt), desc(auditEntries.id))
    .limit(q.perPage)
    .offset((q.page - 1) * q.perPage)
    .all();
  const [{ n }] = db.select({ n: count() }).from(auditEntries).where(where).all();
  return {
    entries: rows.map((r) => ({
      id: r.id,
      actorEmail: r.actorEmail,
      action: r.action,
      flagId: r.flagId,
      detail: r.detail,
      createdAt: r.createdAt.toISOString(),
    })),
    total: n,
  };
}
