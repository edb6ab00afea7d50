import { and, eq, inArray } from 'drizzle-orm';
import type Stripe from 'stripe';
import { billingCustomers, organisations, subscriptions } from '../../../db/schema';
import { SUBSCRIPTION_STATUSES } from '../../../db/schema';
import type { SubscriptionStatus } from '../../../db/schema';
import type { Db } from '../db/client';

type Tx = Pick<Db, 'select' | 'insert' | 'update'>;
export type SubscriptionRow = typeof subscriptions.$inferSelect;

const ms = (unix: number | null | undefined): Date | null => (unix ? new Date(unix * 1000) : null);
/** Subscription metadata key naming the subscription a cancelled duplicate gave way to. */
export const DUPLICATE_OF_KEY = 'duplicate_of';
/** States in which the organisation is on the paid plan (past due still is, for its grace). */
export const PAYING: readonly SubscriptionStatus[] = ['trialing', 'active', 'past_due'];

function statusOf(status: string): SubscriptionStatus {
  const known = SUBSCRIPTION_STATUSES as readonly string[];
  return (known.includes(status) ? status : 'incomplete') as SubscriptionStatus;
}

/** Our row for a subscription as the service returned it; `syncedAt` is when we asked. */
export function rowFrom(
  sub: Stripe.Subscription,
  organisationId: string,
  syncedAt: Date,
): SubscriptionRow {
  const item = sub.items.data[0];
  return {
    id: sub.id,
    organisationId,
    customerId: typeof sub.customer === 'string' ? sub.customer : sub.customer.id,
    status: statusOf(sub.status),
    priceId: item.price.id,
    itemId: item.id,
    interval: item.price.recurring?.interval === 'year' ? 'year' : 'month',
    seats: item.quantity ?? 1,
    cancelAtPeriodEnd: sub.cancel_at_period_end,
    currentPeriodStart: ms(item.current_period_start),
    currentPeriodEnd: ms(item.current_period_end),
    trialEnd: ms(sub.trial_end),
    canceledAt: ms(sub.canceled_at),
    endedAt: ms(sub.ended_at),
    startedAt: ms(sub.start_date ?? sub.created)!,
    pastDueSince: sub.status === 'past_due' ? syncedAt : null,
    syncedAt,
    duplicateOf: sub.metadata?.[DUPLICATE_OF_KEY] ?? null,
  };
}

/**
 * Why an incoming state must not replace the stored one: it was read earlier, it belongs to an
 * earlier billing period, or it would bring an ended subscription back. Null when it may apply.
 */
export function staleReason(stored: SubscriptionRow, next: SubscriptionRow): string | null {
  if (next.syncedAt < stored.syncedAt) return 'read before the stored state';
  if (stored.endedAt && !next.endedAt) return 'the subscription has already ended';
  const a = stored.currentPeriodStart?.getTime() ?? 0;
  const b = next.currentPeriodStart?.getTime() ?? 0;
  if (b < a) return 'from an earlier billing period';
  return null;
}

/** Store a subscription state unless it is stale; keeps the organisation's plan in step. */
export function applySubscription(tx: Tx, next: SubscriptionRow): 'applied' | 'stale' {
  const stored = tx.select().from(subscriptions).where(eq(subscriptions.id, next.id)).get();
  if (stored && staleReason(stored, next)) return 'stale';
  const pastDueSince =
    next.status === 'past_due' ? (stored?.pastDueSince ?? next.pastDueSince) : null;
  const row = { ...next, pastDueSince };
  tx.insert(subscriptions)
    .values(row)
    .onConflictDoUpdate({ target: subscriptions.id, set: row })
    .run();
  refreshPlan(tx, next.organisationId);
  return 'applied';
}

/** organisations.plan is 'pro' while any subscription of theirs is paying, else 'free'. */
function refreshPlan(tx: Tx, organisationId: string): void {
  const paying = tx
    .select({ id: subscriptions.id })
    .from(subscriptions)
    .where(
      and(
        eq(subscriptions.organisationId, organisationId),
        inArray(subscriptions.status, [...PAYING]),
      ),
    )
    .get();
  tx.update(organisations)
    .set({ plan: paying ? 'pro' : 'free' })
    .where(eq(organisations.id, organisationId))
    .run();
}

/** The organisation a customer pays for: our record, else the id we put in its metadata. */
export function organisationForCustomer(
  tx: Tx,
  customerId: string,
  metadataOrg?: string | null,
): string | null {
  const known = tx
    .select()
    .from(billingCustomers)
    .where(eq(billingCustomers.customerId, customerId))
    .get();
  if (known) return known.organisationId;
  if (!metadataOrg) return null;
  const org = tx
    .select({ id: organisations.id })
    .from(organisations)
    .where(eq(organisations.id, metadataOrg))
    .get();
  if (!org) return null;
  tx.insert(billingCustomers)
    .values({ organisationId: org.id, customerId, createdAt: new Date() })
    .onConflictDoNothing()
    .run();
  return org.id;
}
