import { eq, sql } from 'drizzle-orm';
import type Stripe from 'stripe';
import { subscriptions } from '../../../db/schema';
import type { Db } from '../db/client';
import { logger } from '../server/logger';
import { DUPLICATE_OF_KEY, PAYING, applySubscription, rowFrom } from './sync';

/**
 * What the payments service itself holds for a customer, not our copy: our rows lag behind the
 * webhooks, and a subscription whose events have not landed yet still bills. Oldest first.
 * @param seenAt our own order of first sight (lower first; Infinity for unseen), to break a tie
 *   between two created in the same second, as two tabs' checkouts paid moments apart are.
 */
export async function liveAtProvider(
  stripe: Stripe,
  customerId: string,
  seenAt: (id: string) => number = () => Infinity,
): Promise<Stripe.Subscription[]> {
  const live: Stripe.Subscription[] = [];
  for await (const sub of stripe.subscriptions.list({ customer: customerId, limit: 100 })) {
    if ((PAYING as readonly string[]).includes(sub.status)) live.push(sub);
  }
  // Oldest first: the one kept is the one the organisation has been using (seats, card).
  return live.sort(
    (a, b) => a.created - b.created || seenAt(a.id) - seenAt(b.id) || a.id.localeCompare(b.id),
  );
}

/**
 * The order in which our rows of a customer's subscriptions were first stored: SQLite's rowid,
 * which an upsert keeps (a vacuum may renumber it, but keeps the order).
 */
function firstSeenOrder(db: Db, customerId: string): (id: string) => number {
  const rows = db
    .select({ id: subscriptions.id, seen: sql<number>`rowid` })
    .from(subscriptions)
    .where(eq(subscriptions.customerId, customerId))
    .all();
  const order = new Map(rows.map((r) => [r.id, r.seen]));
  return (id) => order.get(id) ?? Infinity;
}

/** Store the service's state of one subscription for an organisation. */
export function storeSubscription(
  db: Db,
  organisationId: string,
  sub: Stripe.Subscription,
  askedAt: Date,
): void {
  db.transaction((tx) => applySubscription(tx, rowFrom(sub, organisationId, askedAt)));
}

/**
 * At most one live subscription per organisation: any newer one (a second checkout page paid
 * after the first) is cancelled now, with proration, and marked as a duplicate of the one kept.
 * Safe to run again and from concurrent deliveries. Returns the ids cancelled.
 */
export async function cancelDuplicates(
  db: Db,
  stripe: Stripe,
  organisationId: string,
  customerId: string,
): Promise<string[]> {
  const [kept, ...extra] = await liveAtProvider(stripe, customerId, firstSeenOrder(db, customerId));
  for (const dup of extra) {
    logger.warn(
      { organisationId, subscriptionId: dup.id, keptId: kept.id },
      'second live subscription for one organisation: cancelling the newer one',
    );
    await cancelDuplicate(db, stripe, organisationId, dup.id, kept.id);
  }
  return extra.map((s) => s.id);
}

async function cancelDuplicate(
  db: Db,
  stripe: Stripe,
  organisationId: string,
  id: string,
  keptId: string,
): Promise<void> {
  try {
    await stripe.subscriptions.update(id, { metadata: { [DUPLICATE_OF_KEY]: keptId } });
    const askedAt = new Date();
    const ended = await stripe.subscriptions.cancel(id, {
      prorate: true,
      invoice_now: true,
      cancellation_details: { comment: `Duplicate of ${keptId}` },
    });
    storeSubscription(db, organisationId, ended, askedAt);
  } catch (error) {
    // Another delivery may have cancelled it a moment ago; only that outcome is fine.
    const askedAt = new Date();
    const now = await stripe.subscriptions.retrieve(id);
    if (now.status !== 'canceled') throw error;
    storeSubscription(db, organisationId, now, askedAt);
  }
}
