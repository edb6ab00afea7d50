import { desc, eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import { subscriptions } from '../../../db/schema';
import type { Db } from '../db/client';
import { seatsInUse as seatsTaken } from '../data/invitations';
import { PAYING, applySubscription, rowFrom } from './sync';
import type { SubscriptionRow } from './sync';

/**
 * The organisation's current subscription: the newest one still paying, else the newest of any
 * state (its last state decides read-only access), else none.
 */
export function currentSubscription(db: Db, organisationId: string): SubscriptionRow | undefined {
  const all = db
    .select()
    .from(subscriptions)
    .where(eq(subscriptions.organisationId, organisationId))
    .orderBy(desc(subscriptions.startedAt))
    .all();
  return all.find((s) => PAYING.includes(s.status)) ?? all[0];
}

/**
 * Paid seats never fall below the seats in use (members and open invitations): when a change made
 * elsewhere (the hosted portal) leaves fewer, put the quantity back up to the seats in use.
 */
export async function keepSeatsAboveMembers(
  db: Db,
  stripe: Stripe,
  organisationId: string,
): Promise<void> {
  const sub = currentSubscription(db, organisationId);
  if (!sub || !PAYING.includes(sub.status)) return;
  const inUse = seatsTaken(organisationId);
  if (sub.seats >= inUse) return;
  const askedAt = new Date();
  const updated = await stripe.subscriptions.update(sub.id, {
    items: [{ id: sub.itemId, quantity: inUse }],
    proration_behavior: 'create_prorations',
  });
  db.transaction((tx) => applySubscription(tx, rowFrom(updated, organisationId, askedAt)));
}
