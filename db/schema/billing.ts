import { relations } from 'drizzle-orm';
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { organisations } from './organisations';

/** Subscription states as the payments service reports them. */
export const SUBSCRIPTION_STATUSES = [
  'incomplete',
  'incomplete_expired',
  'trialing',
  'active',
  'past_due',
  'canceled',
  'unpaid',
  'paused',
] as const;
export type SubscriptionStatus = (typeof SUBSCRIPTION_STATUSES)[number];

/** The payments-service customer that pays for an organisation. */
export const billingCustomers = sqliteTable('billing_customers', {
  organisationId: text('organisation_id')
    .primaryKey()
    .references(() => organisations.id, { onDelete: 'cascade' }),
  customerId: text('customer_id').notNull().unique(),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
});

/**
 * Our copy of each subscription, kept in step by the webhook. Rows are never deleted when a
 * subscription ends: its last state is what makes the organisation read-only rather than gone.
 */
export const subscriptions = sqliteTable(
  'subscriptions',
  {
    id: text('id').primaryKey(),
    organisationId: text('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    customerId: text('customer_id').notNull(),
    status: text('status', { enum: SUBSCRIPTION_STATUSES }).notNull(),
    priceId: text('price_id').notNull(),
    itemId: text('item_id').notNull(),
    interval: text('interval', { enum: ['month', 'year'] }).notNull(),
    seats: integer('seats').notNull(),
    cancelAtPeriodEnd: integer('cancel_at_period_end', { mode: 'boolean' }).notNull(),
    currentPeriodStart: integer('current_period_start', { mode: 'timestamp_ms' }),
    currentPeriodEnd: integer('current_period_end', { mode: 'timestamp_ms' }),
    trialEnd: integer('trial_end', { mode: 'timestamp_ms' }),
    canceledAt: integer('canceled_at', { mode: 'timestamp_ms' }),
    endedAt: integer('ended_at', { mode: 'timestamp_ms' }),
    startedAt: integer('started_at', { mode: 'timestamp_ms' }).notNull(),
    /** When we first saw it past due; the grace period runs from here. */
    pastDueSince: integer('past_due_since', { mode: 'timestamp_ms' }),
    /** When the stored state was read from the service; an older read never overwrites it. */
    syncedAt: integer('synced_at', { mode: 'timestamp_ms' }).notNull(),
    /** Set when we cancelled it as a second live subscription of one organisation: the one kept. */
    duplicateOf: text('duplicate_of'),
  },
  (t) => [index('subscriptions_org_idx').on(t.organisationId, t.startedAt)],
);

/** Every webhook event id applied, so a repeated delivery is recognised and skipped. */
export const billingEvents = sqliteTable('billing_events', {
  id: text('id').primaryKey(),
  type: text('type').notNull(),
  objectId: text('object_id'),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  receivedAt: integer('received_at', { mode: 'timestamp_ms' }).notNull(),
});

export const billingCustomersRelations = relations(billingCustomers, ({ one }) => ({
  organisation: one(organisations, {
    fields: [billingCustomers.organisationId],
    references: [organisations.id],
  }),
}));

export const subscriptionsRelations = relations(subscriptions, ({ one }) => ({
  organisation: one(organisations, {
    fields: [subscriptions.organisationId],
    references: [organisations.id],
  }),
}));
