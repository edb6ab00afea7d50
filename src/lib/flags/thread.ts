import { and, eq, isNotNull } from 'drizzle-orm';
import { flagMessages, flags, users } from '../../../db/schema';
import type { Db } from '../db/client';
import type { StaffActor } from './audit';
import { recordAudit } from './audit';
import { newId } from './ids';
import type { FlagStatus } from './labels';
import { sendReplyEmail } from './mail';
import type { FlagUpdate } from './schemas';

/** Why a desk action was refused, for a 4xx answer. */
export class FlagActionError extends Error {
  constructor(
    readonly status: 404 | 400,
    message: string,
  ) {
    super(message);
  }
}

function flagRow(db: Db, flagId: string): typeof flags.$inferSelect {
  const row = db.select().from(flags).where(eq(flags.id, flagId)).get();
  if (!row) throw new FlagActionError(404, 'No flag with that id.');
  return row;
}

function touch(
  db: Pick<Db, 'update'>,
  flagId: string,
  set: Partial<typeof flags.$inferInsert> = {},
): void {
  db.update(flags)
    .set({ ...set, updatedAt: new Date() })
    .where(eq(flags.id, flagId))
    .run();
}

/** An internal note: stays on the desk, never shown to the reporter. */
export function addNote(db: Db, actor: StaffActor, flagId: string, body: string): string {
  flagRow(db, flagId);
  const id = newId('fmsg');
  // Message, flag stamp and audit entry land together or not at all (so in the other writers).
  db.transaction((tx) => {
    tx.insert(flagMessages)
      .values({ id, flagId, kind: 'note', authorUserId: actor.id, body, createdAt: new Date() })
      .run();
    touch(tx, flagId);
    recordAudit(tx, actor, 'flag.note', flagId, { messageId: id });
  });
  return id;
}

/**
 * A reply: e-mailed to the reporter and kept in the thread either way, marked sent or failed. A
 * new flag moves to 'answered' once a reply goes out; other states are left to staff.
 */
export async function addReply(
  db: Db,
  actor: StaffActor,
  flagId: string,
  body: string,
): Promise<{ id: string; emailStatus: 'sent' | 'failed' }> {
  const flag = flagRow(db, flagId);
  const sent = await sendReplyEmail({ to: flag.reporterEmail, flagId, body });
  const emailStatus = sent ? 'sent' : 'failed';
  const id = newId('fmsg');
  const moveOn = sent && (flag.status === 'new' || flag.status === 'in_hand');
  db.transaction((tx) => {
    tx.insert(flagMessages)
      .values({
        id,
        flagId,
        kind: 'reply',
        authorUserId: actor.id,
        body,
        emailStatus,
        createdAt: new Date(),
      })
      .run();
    touch(tx, flagId, moveOn ? { status: 'answered' } : {});
    recordAudit(tx, actor, 'flag.reply', flagId, { messageId: id, emailStatus });
  });
  return { id, emailStatus };
}

function isStaff(db: Db, userId: string): boolean {
  const row = db
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.id, userId), isNotNull(users.staffRole)))
    .get();
  return Boolean(row);
}

/** Change status and/or assignee; each change is its own audit entry. */
export function updateFlag(db: Db, actor: StaffActor, flagId: string, change: FlagUpdate): void {
  const flag = flagRow(db, flagId);
  const set: { status?: FlagStatus; assigneeUserId?: string | null } = {};
  if (change.assigneeUserId !== undefined) {
    if (change.assigneeUserId !== null && !isStaff(db, change.assigneeUserId)) {
      throw new FlagActionError(400, 'Flags can only be assigned to support staff.');
    }
    set.assigneeUserId = change.assigneeUserId;
  }
  if (change.status !== undefined) set.status = change.status;
  db.transaction((tx) => {
    touch(tx, flagId, set);
    if (change.status !== undefined && change.status !== flag.status) {
      recordAudit(tx, actor, 'flag.status', flagId, { from: flag.status, to: change.status });
    }
    if (change.assigneeUserId !== undefined && change.assigneeUserId !== flag.assigneeUserId) {
      recordAudit(tx, actor, 'flag.assign', flagId, {
        from: flag.assigneeUserId,
        to: change.assigneeUserId,
      });
    }
  });
}
