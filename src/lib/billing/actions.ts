import { eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import { billingCustomers } from '../../../db/schema';
import type { Db } from '../db/client';
import { seatsInUse } from '../data/invitations';
import type { BillingInterval } from './plans';
import { MAX_SEATS, TRIAL_DAYS } from './plans';
import { proPriceIds } from './prices';
import { checkoutRefusal, entitlementFor } from './entitlements';
import { cancelDuplicates, liveAtProvider, storeSubscription } from './live-subscriptions';
import { currentSubscription } from './seat-floor';
import { getStripe } from './stripe-client';
import { PAYING, applySubscription, rowFrom } from './sync';
import type { SubscriptionRow } from './sync';

/** A refusal the billing API turns into JSON `{ error: code, message }` with this status. */
export class BillingError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

interface Org {
  id: string;
  name: string;
}

/** The payments customer for an organisation, created on first checkout. */
async function customerFor(db: Db, org: Org, email: string): Promise<string> {
  const known = db
    .select()
    .from(billingCustomers)
    .where(eq(billingCustomers.organisationId, org.id))
    .get();
  if (known) return known.customerId;
  const customer = await getStripe().customers.create({
    email,
    name: org.name,
    metadata: { organisation_id: org.id },
  });
  db.insert(billingCustomers)
    .values({ organisationId: org.id, customerId: customer.id, createdAt: new Date() })
    .onConflictDoNothing()
    .run();
  return db
    .select()
    .from(billingCustomers)
    .where(eq(billingCustomers.organisationId, org.id))
    .get()!.customerId;
}

function checkSeats(organisationId: string, seats: number): void {
  const inUse = seatsInUse(organisationId);
  if (!Number.isInteger(seats) || seats < 1 || seats > MAX_SEATS) {
    throw new BillingError(
      400,
      'invalid_seats',
      `Seats must be a whole number from 1 to ${MAX_SEATS}.`,
    );
  }
  if (seats < inUse) {
    throw new BillingError(
      409,
      'seats_below_members',
      `${inUse} seats are in use (members and open invitations); remove someone first.`,
    );
  }
}

/**
 * Start a checkout for the Crew plan; returns the hosted page's URL. The trial is for first-timers.
 * Refused while the organisation holds the plan, by grant or by a live subscription here or at the
 * payments service (whose events may not have reached us yet).
 */
export async function startCheckout(
  db: Db,
  args: { org: Org; email: string; interval: BillingInterval; seats: number; origin: string },
): Promise<string> {
  const refusal = checkoutRefusal(entitlementFor(db, args.org.id));
  if (refusal) throw new BillingError(409, refusal.code, refusal.message);
  const current = currentSubscription(db, args.org.id);
  checkSeats(args.org.id, args.seats);
  const stripe = getStripe();
  const prices = await proPriceIds(stripe);
  const customer = await customerFor(db, args.org, args.email);
  await refuseIfLiveAtProvider(db, stripe, args.org.id, customer);
  const firstTime = !current;
  const session = await stripe.checkout.sessions.create({
    mode: 'subscription',
    customer,
    client_reference_id: args.org.id,
    line_items: [{ price: prices[args.interval], quantity: args.seats }],
    subscription_data: {
      metadata: { organisation_id: args.org.id },
      ...(firstTime ? { trial_period_days: TRIAL_DAYS } : {}),
    },
    success_url: `${args.origin}/app/billing?checkout=done&session={CHECKOUT_SESSION_ID}`,
    cancel_url: `${args.origin}/app/billing?checkout=cancelled`,
  });
  if (!session.url)
    throw new BillingError(
      502,
      'no_checkout_url',
      'The payments service returned no checkout page.',
    );
  return session.url;
}

async function refuseIfLiveAtProvider(
  db: Db,
  stripe: Stripe,
  organisationId: string,
  customerId: string,
): Promise<void> {
  const askedAt = new Date();
  const live = await liveAtProvider(stripe, customerId);
  if (live.length === 0) return;
  for (const sub of live) storeSubscription(db, organisationId, sub, askedAt);
  const refusal = checkoutRefusal(entitlementFor(db, organisationId));
  throw new BillingError(409, refusal?.code ?? 'already_subscribed', refusal?.message ?? '');
}

/** After the hosted checkout returns: read the new subscription now rather than wait for the event. */
export async function syncCheckout(
  db: Db,
  organisationId: string,
  sessionId: string,
): Promise<void> {
  const stripe = getStripe();
  const session = await stripe.checkout.sessions.retrieve(sessionId);
  if (session.client_reference_id !== organisationId || typeof session.subscription !== 'string')
    return;
  const row = await syncSubscription(db, organisationId, session.subscription);
  // The webhook does the same; whichever comes first stops a second live subscription.
  if (PAYING.includes(row.status))
    await cancelDuplicates(db, stripe, organisationId, row.customerId);
}

async function syncSubscription(
  db: Db,
  organisationId: string,
  id: string,
): Promise<SubscriptionRow> {
  const askedAt = new Date();
  const sub = await getStripe().subscriptions.retrieve(id);
  const row = rowFrom(sub, organisationId, askedAt);
  db.transaction((tx) => applySubscription(tx, row));
  return row;
}

function liveSubscription(db: Db, organisationId: string): SubscriptionRow {
  const sub = currentSubscription(db, organisationId);
  if (!sub || !PAYING.includes(sub.status)) {
    throw new BillingError(409, 'no_subscription', 'There is no running Crew plan to change.');
  }
  return sub;
}

/** Change the paid seats; never below the seats in use. */
export async function changeSeats(
  db: Db,
  organisationId: string,
  seats: number,
): Promise<SubscriptionRow> {
  const sub = liveSubscription(db, organisationId);
  checkSeats(organisationId, seats);
  await getStripe().subscriptions.update(sub.id, {
    items: [{ id: sub.itemId, quantity: seats }],
    proration_behavior: 'create_prorations',
  });
  return syncSubscription(db, organisationId, sub.id);
}

/**
 * Cancel at the end of the period (default) or now. Data stays; the organisation turns read-only.
 * Acts on every live subscription the payments service holds for the customer, not only the one
 * we show, so nothing keeps renewing after the owner is told the plan ends.
 */
export async function cancelPlan(
  db: Db,
  organisationId: string,
  when: 'period_end' | 'now',
): Promise<SubscriptionRow> {
  const sub = liveSubscription(db, organisationId);
  const stripe = getStripe();
  for (const live of await liveAtProvider(stripe, sub.customerId)) {
    const askedAt = new Date();
    const changed =
      when === 'now'
        ? await stripe.subscriptions.cancel(live.id)
        : await stripe.subscriptions.update(live.id, { cancel_at_period_end: true });
    storeSubscription(db, organisationId, changed, askedAt);
  }
  return syncSubscription(db, organisationId, sub.id);
}

/** Take back a cancellation set for the end of the period. */
export async function resumePlan(db: Db, organisationId: string): Promise<SubscriptionRow> {
  const sub = liveSubscription(db, organisationId);
  if (!sub.cancelAtPeriodEnd)
    throw new BillingError(409, 'not_cancelling', 'The plan is not set to end.');
  await getStripe().subscriptions.update(sub.id, { cancel_at_period_end: false });
  return syncSubscription(db, organisationId, sub.id);
}
