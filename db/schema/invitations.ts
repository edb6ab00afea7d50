import { relations } from 'drizzle-orm';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { organisations } from './organisations';
import { users } from './users';

/**
 * An owner's invitation for someone to join their organisation. Only a hash of the link's token
 * is stored; the link expires and works once (acceptedAt set), and an owner may withdraw it.
 */
export const invitations = sqliteTable(
  'invitations',
  {
    id: text('id').primaryKey(),
    organisationId: text('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: ['owner', 'member'] }).notNull().default('member'),
    /** SHA-256 (hex) of the token in the invitation link. */
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
    acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
    acceptedBy: text('accepted_by').references(() => users.id, { onDelete: 'set null' }),
    revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
  },
  (t) => [index('invitations_org_idx').on(t.organisationId, t.createdAt)],
);

export const invitationsRelations = relations(invitations, ({ one }) => ({
  organisation: one(organisations, {
    fields: [invitations.organisationId],
    references: [organisations.id],
  }),
}));
