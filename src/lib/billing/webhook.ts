import { eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import { billingEvents } from '../../../db/schema';
import type { Db } from '../db/client';
import { keepSeatsAboveMembers } from './seat-floor';
import { cancelDuplicates } from './live-subscriptions';
import { PAYING, applySubscription, organisationForCustomer, rowFrom } from './sync';

const customerOf = (sub: Stripe.Subscription): string =>
  typeof sub.customer === 'string' ? sub.customer : sub.customer.id;

export type EventOutcome = 'applied' | 'stale' | 'duplicate' | 'ignored';

/** The subscription an event concerns, whatever kind of object it carries. */
function subscriptionIdOf(event: Stripe.Event): string | null {
  const object = event.data.object as unknown as Record<string, unknown>;
  if (event.type.startsWith('customer.subscription.')) return object.id as string;
  const direct = object.subscription;
  if (typeof direct === 'string') return direct;
  if (direct && typeof direct === 'object') return (direct as { id: string }).id;
  const parent = object.parent as
    { subscription_details?: { subscription?: unknown } } | null | undefined;
  const viaParent = parent?.subscription_details?.subscription;
  if (typeof viaParent === 'string') return viaParent;
  return null;
}

/** The organisation hint an event carries: the checkout's reference or the subscription metadata. */
function organisationHint(event: Stripe.Event, sub: Stripe.Subscription | null): string | null {
  const object = event.data.object as unknown as Record<string, unknown>;
  if (typeof object.client_reference_id === 'string') return object.client_reference_id;
  return sub?.metadata?.organisation_id ?? null;
}

/**
 * Apply one verified event. The subscription is read afresh from the service (the event's copy
 * may be older than what we hold), and stored only if it is newer than our row; the event id is
 * recorded in the same transaction, so a repeat is recognised and changes nothing. A live
 * subscription that makes a second one for its organisation is cancelled (see live-subscriptions).
 */
export async function processEvent(
  db: Db,
  stripe: Stripe,
  event: Stripe.Event,
): Promise<EventOutcome> {
  if (db.select().from(billingEvents).where(eq(billingEvents.id, event.id)).get())
    return 'duplicate';
  const subscriptionId = subscriptionIdOf(event);
  const askedAt = new Date();
  const sub = subscriptionId ? await freshSubscription(stripe, subscriptionId, event) : null;
  let organisationId: string | null = null;
  const outcome = db.transaction((tx): EventOutcome => {
    const inserted = tx
      .insert(billingEvents)
      .values({
        id: event.id,
        type: event.type,
        objectId: subscriptionId,
        createdAt: new Date(event.created * 1000),
        receivedAt: new Date(),
      })
      .onConflictDoNothing()
      .run();
    if (inserted.changes === 0) return 'duplicate';
    if (!sub) return 'ignored';
    organisationId = organisationForCustomer(tx, customerOf(sub), organisationHint(event, sub));
    if (!organisationId) return 'ignored';
    return applySubscription(tx, rowFrom(sub, organisationId, askedAt));
  });
  if (outcome === 'applied' && organisationId && sub) {
    if ((PAYING as readonly string[]).includes(sub.status))
      await cancelDuplicates(db, stripe, organisationId, customerOf(sub));
    await keepSeatsAboveMembers(db, stripe, organisationId);
  }
  return outcome;
}

/**
 * The subscription as the service has it now. When the service no longer has it (deleted test
 * data), fall back to the copy inside a subscription event.
 */
async function freshSubscription(
  stripe: Stripe,
  id: string,
  event: Stripe.Event,
): Promise<Stripe.Subscription | null> {
  try {
    return await stripe.subscriptions.retrieve(id);
  } catch (error) {
    const missing = (error as { code?: string }).code === 'resource_missing';
    if (missing && event.type.startsWith('customer.subscription.')) {
      return event.data.object as Stripe.Subscription;
    }
    if (missing) return null;
    throw error;
  }
}
