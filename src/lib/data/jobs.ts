import { randomUUID } from 'node:crypto';
import { and, asc, count, desc, eq, or, sql } from 'drizzle-orm';
import type { AnyColumn, SQL } from 'drizzle-orm';
import { calculations, JOB_STATUSES, jobs } from '../../../db/schema';
import { getDb } from '../db/client';
import type { Db } from '../db/client';

export type JobStatus = (typeof JOB_STATUSES)[number];
export type JobRow = typeof jobs.$inferSelect;
export interface JobListItem extends JobRow {
  calculationCount: number;
}

export const JOB_SORTS = ['updated', 'created', 'title', 'client', 'status'] as const;
export type JobSort = (typeof JOB_SORTS)[number];

export interface JobQuery {
  q?: string;
  status?: JobStatus;
  sort?: JobSort;
  dir?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

export interface JobPage {
  items: JobListItem[];
  total: number;
  page: number;
  pageSize: number;
}

export interface JobFields {
  title: string;
  client: string;
  siteAddress: string;
  notes: string;
  status: JobStatus;
}

const SORT_COLUMNS = {
  updated: jobs.updatedAt,
  created: jobs.createdAt,
  title: sql`lower(${jobs.title})`,
  client: sql`lower(${jobs.client})`,
  status: jobs.status,
} as const;

/** A LIKE pattern matching `text` literally anywhere (%, _ and \ escaped). */
function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

function jobFilter(orgId: string, query: JobQuery): SQL {
  const parts: SQL[] = [eq(jobs.organisationId, orgId)];
  if (query.status) parts.push(eq(jobs.status, query.status));
  const q = query.q?.trim();
  if (q) {
    const p = containsPattern(q);
    const esc = (col: AnyColumn): SQL => sql`${col} like ${p} escape '\\'`;
    parts.push(or(esc(jobs.title), esc(jobs.client), esc(jobs.siteAddress), esc(jobs.notes))!);
  }
  return and(...parts)!;
}

/** One page of an organisation's jobs, searched, filtered and sorted, with calculation counts. */
export function listJobs(orgId: string, query: JobQuery = {}): JobPage {
  const db = getDb();
  const pageSize = Math.min(Math.max(query.pageSize ?? 20, 1), 100);
  const page = Math.max(query.page ?? 1, 1);
  const where = jobFilter(orgId, query);
  const column = SORT_COLUMNS[query.sort ?? 'updated'];
  const order = (query.dir ?? (query.sort && query.sort !== 'updated' && query.sort !== 'created' ? 'asc' : 'desc')) === 'asc' ? asc : desc;
  const counts = db
    .select({ jobId: calculations.jobId, n: count().as('n') })
    .from(calculations)
    .where(eq(calculations.organisationId, orgId))
    .groupBy(calculations.jobId)
    .as('counts');
  const rows = db
    .select({ job: jobs, n: counts.n })
    .from(jobs)
    .leftJoin(counts, eq(counts.jobId, jobs.id))
    .where(where)
    .orderBy(order(column), desc(jobs.updatedAt), asc(jobs.id))
    .limit(pageSize)
    .offset((page - 1) * pageSize)
    .all();
  const [totalRow] = db.select({ n: count() }).from(jobs).where(where).all();
  return {
    items: rows.map((r) => ({ ...r.job, calculationCount: r.n ?? 0 })),
    total: totalRow?.n ?? 0,
    page,
    pageSize,
  };
}

/** One job of this organisation, or null (also for another organisation's id). */
export function getJob(orgId: string, jobId: string): JobRow | null {
  return (
    getDb()
      .select()
      .from(jobs)
      .where(and(eq(jobs.organisationId, orgId), eq(jobs.id, jobId)))
      .get() ?? null
  );
}

export function createJob(orgId: string, userId: string | null, fields: Partial<JobFields> & { title: string }): JobRow {
  const now = new Date();
  const row = {
    id: `job_${randomUUID()}`,
    organisationId: orgId,
    title: fields.title,
    client: fields.client ?? '',
    siteAddress: fields.siteAddress ?? '',
    notes: fields.notes ?? '',
    status: fields.status ?? 'scoping',
    revision: 1,
    createdBy: userId,
    updatedBy: userId,
    createdAt: now,
    updatedAt: now,
  } satisfies JobRow;
  getDb().insert(jobs).values(row).run();
  return row;
}

/** What an edit came to: the saved job, the newer job it lost to, or no such job. */
export type JobUpdate =
  | { kind: 'saved'; job: JobRow }
  | { kind: 'stale'; current: JobRow }
  | { kind: 'missing' };

/**
 * Change some fields, but only if the job is still at `revision` (the one the editor loaded), so
 * a stale tab cannot silently overwrite a newer save; each edit bumps the revision by one.
 */
export function updateJob(
  orgId: string,
  jobId: string,
  userId: string | null,
  patch: Partial<JobFields>,
  revision: number,
): JobUpdate {
  const mine = and(eq(jobs.organisationId, orgId), eq(jobs.id, jobId));
  const res = getDb()
    .update(jobs)
    .set({ ...patch, revision: sql`${jobs.revision} + 1`, updatedBy: userId, updatedAt: new Date() })
    .where(and(mine, eq(jobs.revision, revision)))
    .run();
  const row = getJob(orgId, jobId);
  if (!row) return { kind: 'missing' };
  return res.changes ? { kind: 'saved', job: row } : { kind: 'stale', current: row };
}

/**
 * Mark a job as changed now (a calculation was added or removed). Pass the transaction when the
 * change it records is made in one, so both land or neither does. The revision stays: it guards
 * the job's own fields, which a calculation does not change.
 */
export function touchJob(
  orgId: string,
  jobId: string,
  userId: string | null,
  db: Pick<Db, 'update'> = getDb(),
): void {
  db.update(jobs)
    .set({ updatedBy: userId, updatedAt: new Date() })
    .where(and(eq(jobs.organisationId, orgId), eq(jobs.id, jobId)))
    .run();
}

/** Delete a job and (by cascade) its calculations; false when it is not this organisation's. */
export function deleteJob(orgId: string, jobId: string): boolean {
  const res = getDb()
    .delete(jobs)
    .where(and(eq(jobs.organisationId, orgId), eq(jobs.id, jobId)))
    .run();
  return res.changes > 0;
}

/** Every job of an organisation, oldest first (export). */
export function allJobs(orgId: string): JobRow[] {
  return getDb().select().from(jobs).where(eq(jobs.organisationId, orgId)).orderBy(asc(jobs.createdAt), asc(jobs.id)).all();
}
