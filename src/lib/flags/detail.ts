import { asc, eq, isNotNull } from 'drizzle-orm';
import { flagMessages, flagSnapshots, flags, organisations, users } from '../../../db/schema';
import type { Db } from '../db/client';
import type { FlagReason, FlagStatus, FlagTool } from './labels';

export interface Snapshot {
  inputs: Record<string, unknown>;
  results: Record<string, unknown>;
  engineVersion: string;
  unitSystem: 'metric' | 'us';
  page: string;
  createdAt: string;
}

export interface ThreadMessage {
  id: string;
  kind: 'reply' | 'note';
  authorName: string | null;
  body: string;
  emailStatus: 'sent' | 'failed' | null;
  createdAt: string;
}

export interface FlagDetail {
  id: string;
  tool: FlagTool;
  reason: FlagReason;
  message: string;
  status: FlagStatus;
  reporterUserId: string | null;
  reporterEmail: string;
  reporterName: string | null;
  organisationName: string | null;
  assigneeUserId: string | null;
  createdAt: string;
  updatedAt: string;
  snapshot: Snapshot;
  messages: ThreadMessage[];
}

function snapshotOf(db: Db, flagId: string): Snapshot {
  const s = db.select().from(flagSnapshots).where(eq(flagSnapshots.flagId, flagId)).get();
  if (!s) throw new Error(`flag ${flagId} has no snapshot`);
  return {
    inputs: s.inputs as Record<string, unknown>,
    results: s.results as Record<string, unknown>,
    engineVersion: s.engineVersion,
    unitSystem: s.unitSystem,
    page: s.page,
    createdAt: s.createdAt.toISOString(),
  };
}

function messagesOf(db: Db, flagId: string): ThreadMessage[] {
  return db
    .select({
      id: flagMessages.id,
      kind: flagMessages.kind,
      authorName: users.name,
      body: flagMessages.body,
      emailStatus: flagMessages.emailStatus,
      createdAt: flagMessages.createdAt,
    })
    .from(flagMessages)
    .leftJoin(users, eq(users.id, flagMessages.authorUserId))
    .where(eq(flagMessages.flagId, flagId))
    .orderBy(asc(flagMessages.createdAt), asc(flagMessages.id))
    .all()
    .map((m) => ({ ...m, createdAt: m.createdAt.toISOString() }));
}

/** A flag with its snapshot and whole thread (notes included: staff only), or null. */
export function getFlagDetail(db: Db, id: string): FlagDetail | null {
  const row = db
    .select({ flag: flags, reporterName: users.name, organisationName: organisations.name })
    .from(flags)
    .leftJoin(users, eq(users.id, flags.reporterUserId))
    .leftJoin(organisations, eq(organisations.id, flags.organisationId))
    .where(eq(flags.id, id))
    .get();
  if (!row) return null;
  const { viewTokenHash: _hidden, organisationId: _org, ...f } = row.flag;
  return {
    ...f,
    reporterName: row.reporterName,
    organisationName: row.organisationName,
    createdAt: f.createdAt.toISOString(),
    updatedAt: f.updatedAt.toISOString(),
    snapshot: snapshotOf(db, id),
    messages: messagesOf(db, id),
  };
}

/** The same flag as its reporter may see it: replies only, no internal notes. */
export function forReporter(detail: FlagDetail): FlagDetail {
  return { ...detail, messages: detail.messages.filter((m) => m.kind === 'reply') };
}

export interface StaffMember {
  id: string;
  name: string | null;
  email: string;
}

/** Everyone a flag can be assigned to. */
export function listStaff(db: Db): StaffMember[] {
  return db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(isNotNull(users.staffRole))
    .orderBy(asc(users.name))
    .all();
}
