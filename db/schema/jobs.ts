import { relations } from 'drizzle-orm';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { organisations } from './organisations';
import { users } from './users';

/** Job states, in the order a job usually moves through them. */
export const JOB_STATUSES = ['scoping', 'quoted', 'on_site', 'wrapped_up'] as const;

/** A piece of work for a client at a site; holds many calculations. */
export const jobs = sqliteTable(
  'jobs',
  {
    id: text('id').primaryKey(),
    organisationId: text('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    title: text('title').notNull(),
    client: text('client').notNull().default(''),
    siteAddress: text('site_address').notNull().default(''),
    notes: text('notes').notNull().default(''),
    status: text('status', { enum: JOB_STATUSES }).notNull().default('scoping'),
    /** Bumped by every edit of the fields above; a save names the revision it was loaded at. */
    revision: integer('revision').notNull().default(1),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    updatedBy: text('updated_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('jobs_org_idx').on(t.organisationId, t.updatedAt)],
);

/** A frozen calculation: the inputs, the engine's results and the engine version. */
export const calculations = sqliteTable(
  'calculations',
  {
    id: text('id').primaryKey(),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    organisationId: text('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    tool: text('tool', { enum: ['line', 'siphon', 'drain'] }).notNull(),
    label: text('label').notNull().default(''),
    inputs: text('inputs', { mode: 'json' }).notNull(),
    results: text('results', { mode: 'json' }).notNull(),
    unitSystem: text('unit_system', { enum: ['metric', 'us'] }).notNull(),
    engineVersion: text('engine_version').notNull(),
    /** The calculation this one revises, when saved as a new revision. */
    revisionOf: text('revision_of'),
    /** Path and query that reopen these inputs in their calculator (its share URL), if known. */
    openPath: text('open_path'),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('calculations_job_idx').on(t.jobId)],
);

/** A read-only link to a job's report: the token is only in the link, we keep its SHA-256. */
export const reportShares = sqliteTable(
  'report_shares',
  {
    id: text('id').primaryKey(),
    tokenHash: text('token_hash').notNull().unique(),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    organisationId: text('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
    revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
  },
  (t) => [index('report_shares_job_idx').on(t.jobId)],
);

export const jobsRelations = relations(jobs, ({ one, many }) => ({
  organisation: one(organisations, { fields: [jobs.organisationId], references: [organisations.id] }),
  calculations: many(calculations),
  reportShares: many(reportShares),
}));

export const calculationsRelations = relations(calculations, ({ one }) => ({
  job: one(jobs, { fields: [calculations.jobId], references: [jobs.id] }),
}));

export const reportSharesRelations = relations(reportShares, ({ one }) => ({
  job: one(jobs, { fields: [reportShares.jobId], references: [jobs.id] }),
}));
