import { relations } from 'drizzle-orm';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { organisations } from './organisations';
import { users } from './users';

/** Why someone flagged a result; the words shown for each live in src/lib/flags/labels.ts. */
export const FLAG_REASONS = ['looks_wrong', 'site_differs', 'need_help'] as const;

/** Where a flag stands, in the order support usually moves it along. */
export const FLAG_STATUSES = [
  'new',
  'in_hand',
  'waiting_on_reporter',
  'answered',
  'closed',
] as const;

/** The engine tools a result can come from. */
export const FLAG_TOOLS = ['line', 'siphon', 'drain'] as const;

/** A result someone told us looks doubtful, and who is working on it. */
export const flags = sqliteTable(
  'flags',
  {
    id: text('id').primaryKey(),
    tool: text('tool', { enum: FLAG_TOOLS }).notNull(),
    reason: text('reason', { enum: FLAG_REASONS }).notNull(),
    message: text('message').notNull().default(''),
    reporterUserId: text('reporter_user_id').references(() => users.id, { onDelete: 'set null' }),
    /** Always set: the signed-in user's address, or the one a signed-out reporter typed. */
    reporterEmail: text('reporter_email').notNull(),
    organisationId: text('organisation_id').references(() => organisations.id, {
      onDelete: 'set null',
    }),
    status: text('status', { enum: FLAG_STATUSES }).notNull().default('new'),
    assigneeUserId: text('assignee_user_id').references(() => users.id, { onDelete: 'set null' }),
    /** SHA-256 of the reporter's view token; the token itself is only ever in their e-mail. */
    viewTokenHash: text('view_token_hash').notNull().unique(),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [
    index('flags_status_idx').on(t.status, t.createdAt),
    index('flags_reporter_idx').on(t.reporterUserId),
  ],
);

/**
 * What the reporter saw, frozen at the moment of flagging. A trigger in the migrations refuses
 * every UPDATE and DELETE, so the record support works from is the one the user sent.
 */
export const flagSnapshots = sqliteTable('flag_snapshots', {
  flagId: text('flag_id')
    .primaryKey()
    .references(() => flags.id),
  inputs: text('inputs', { mode: 'json' }).notNull(),
  results: text('results', { mode: 'json' }).notNull(),
  engineVersion: text('engine_version').notNull(),
  unitSystem: text('unit_system', { enum: ['metric', 'us'] }).notNull(),
  /** Path of the page the result was on, e.g. /check. */
  page: text('page').notNull(),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
});

/** Replies go to the reporter by e-mail; notes stay inside the support desk. */
export const FLAG_MESSAGE_KINDS = ['reply', 'note'] as const;

/** The thread on a flag: replies to the reporter and internal notes. */
export const flagMessages = sqliteTable(
  'flag_messages',
  {
    id: text('id').primaryKey(),
    flagId: text('flag_id')
      .notNull()
      .references(() => flags.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: FLAG_MESSAGE_KINDS }).notNull(),
    authorUserId: text('author_user_id').references(() => users.id, { onDelete: 'set null' }),
    body: text('body').notNull(),
    /** For replies: 'sent' or 'failed', so staff can see whether the reporter got it. */
    emailStatus: text('email_status', { enum: ['sent', 'failed'] }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('flag_messages_flag_idx').on(t.flagId, t.createdAt)],
);

/** Who on staff looked at or did what, and when; admins read it, nobody edits it. */
export const auditEntries = sqliteTable(
  'audit_entries',
  {
    id: text('id').primaryKey(),
    actorUserId: text('actor_user_id').references(() => users.id, { onDelete: 'set null' }),
    /** Kept as text too, so the log still says who after a user is removed. */
    actorEmail: text('actor_email').notNull(),
    action: text('action').notNull(),
    flagId: text('flag_id').references(() => flags.id, { onDelete: 'set null' }),
    detail: text('detail', { mode: 'json' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [
    index('audit_entries_created_idx').on(t.createdAt),
    index('audit_entries_flag_idx').on(t.flagId),
  ],
);

export const flagsRelations = relations(flags, ({ one, many }) => ({
  snapshot: one(flagSnapshots, { fields: [flags.id], references: [flagSnapshots.flagId] }),
  messages: many(flagMessages),
  organisation: one(organisations, {
    fields: [flags.organisationId],
    references: [organisations.id],
  }),
}));

export const flagSnapshotsRelations = relations(flagSnapshots, ({ one }) => ({
  flag: one(flags, { fields: [flagSnapshots.flagId], references: [flags.id] }),
}));

export const flagMessagesRelations = relations(flagMessages, ({ one }) => ({
  flag: one(flags, { fields: [flagMessages.flagId], references: [flags.id] }),
}));

export const auditEntriesRelations = relations(auditEntries, ({ one }) => ({
  flag: one(flags, { fields: [auditEntries.flagId], references: [flags.id] }),
}));
