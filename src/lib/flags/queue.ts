import { and, asc, count, desc, eq, ne } from 'drizzle-orm';
import type { SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/sqlite-core';
import { flags, organisations, users } from '../../../db/schema';
import type { Db } from '../db/client';
import type { FlagReason, FlagStatus, FlagTool } from './labels';
import type { QueueQuery } from './schemas';

export interface QueueRow {
  id: string;
  status: FlagStatus;
  tool: FlagTool;
  reason: FlagReason;
  reporterEmail: string;
  reporterName: string | null;
  organisationName: string | null;
  assigneeUserId: string | null;
  assigneeName: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface QueuePage {
  flags: QueueRow[];
  total: number;
  page: number;
  perPage: number;
}

function filters(q: QueueQuery): SQL | undefined {
  const parts: SQL[] = [];
  if (q.status === 'open') parts.push(ne(flags.status, 'closed'));
  else if (q.status !== 'all') parts.push(eq(flags.status, q.status));
  if (q.tool !== 'all') parts.push(eq(flags.tool, q.tool));
  return parts.length ? and(...parts) : undefined;
}

/** One page of the support queue, filtered by status and tool, sorted by age. */
export function listQueue(db: Db, q: QueueQuery): QueuePage {
  const reporter = alias(users, 'reporter');
  const assignee = alias(users, 'assignee');
  const where = filters(q);
  const order = q.sort === 'oldest' ? asc : desc;
  const rows = db
    .select({
      id: flags.id,
      status: flags.status,
      tool: flags.tool,
      reason: flags.reason,
      reporterEmail: flags.reporterEmail,
      reporterName: reporter.name,
      organisationName: organisations.name,
      assigneeUserId: flags.assigneeUserId,
      assigneeName: assignee.name,
      createdAt: flags.createdAt,
      updatedAt: flags.updatedAt,
    })
    .from(flags)
    .leftJoin(reporter, eq(reporter.id, flags.reporterUserId))
    .leftJoin(assignee, eq(assignee.id, flags.assigneeUserId))
    .leftJoin(organisations, eq(organisations.id, flags.organisationId))
    .where(where)
    .orderBy(order(flags.createdAt), order(flags.id))
    .limit(q.perPage)
    .offset((q.page - 1) * q.perPage)
    .all();
  const [{ n }] = db.select({ n: count() }).from(flags).where(where).all();
  return {
    flags: rows.map((r) => ({
      ...r,
      createdAt: r.createdAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
    })),
    total: n,
    page: q.page,
    perPage: q.perPage,
  };
}
