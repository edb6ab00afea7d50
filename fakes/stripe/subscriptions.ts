import { createInvoice, settleInvoice } from './invoices';
import type { Deliveries } from './webhooks';
import type { Obj, Store } from './store';
import { invalid, listOf, missing, newId } from './store';

const DAY = 86_400;

/** The length of one billing period in seconds for a price's interval. */
export function periodSeconds(price: Obj, from: number): number {
  const d = new Date(from * 1000);
  if (price.recurring?.interval === 'year') d.setUTCFullYear(d.getUTCFullYear() + 1);
  else if (price.recurring?.interval === 'week') d.setUTCDate(d.getUTCDate() + 7);
  else if (price.recurring?.interval === 'day') d.setUTCDate(d.getUTCDate() + 1);
  else d.setUTCMonth(d.getUTCMonth() + 1);
  return Math.floor(d.getTime() / 1000) - from;
}

export function getSubscription(store: Store, id: string): Obj {
  const sub = store.state.subscriptions[id];
  if (!sub) throw missing('subscription', id);
  return sub;
}

/** Start a subscription for a customer; with trial days it starts `trialing` with a zero invoice. */
export function startSubscription(
  store: Store,
  hooks: Deliveries,
  args: {
    customer: string;
    price: Obj;
    quantity: number;
    trialDays: number;
    metadata: Obj;
    paymentMethod: string;
  },
): Obj {
  const now = store.now();
  const trialEnd = args.trialDays > 0 ? now + args.trialDays * DAY : null;
  const periodEnd = trialEnd ?? now + periodSeconds(args.price, now);
  const id = newId('sub');
  const sub: Obj = {
    id,
    object: 'subscription',
    customer: args.customer,
    status: trialEnd ? 'trialing' : 'active',
    items: listOf(
      [
        {
          id: newId('si'),
          object: 'subscription_item',
          price: args.price,
          quantity: args.quantity,
          subscription: id,
          created: now,
          current_period_start: now,
          current_period_end: periodEnd,
          metadata: {},
        },
      ],
      `/v1/subscription_items?subscription=${id}`,
    ),
    cancel_at_period_end: false,
    cancel_at: null,
    canceled_at: null,
    cancellation_details: { comment: null, feedback: null, reason: null },
    ended_at: null,
    created: now,
    start_date: now,
    billing_cycle_anchor: periodEnd,
    trial_start: trialEnd ? now : null,
    trial_end: trialEnd,
    currency: args.price.currency,
    collection_method: 'charge_automatically',
    default_payment_method: args.paymentMethod,
    latest_invoice: null,
    metadata: args.metadata,
    livemode: false,
  };
  store.state.subscriptions[id] = sub;
  hooks.emit('customer.subscription.created', sub);
  const invoice = createInvoice(store, sub, trialEnd ? 0 : undefined, 'subscription_create');
  settleInvoice(store, hooks, sub, invoice, !trialEnd);
  store.save();
  return sub;
}

/** Apply the update parameters the app and the portal use: seat quantity and cancel at period end. */
export function updateSubscription(
  store: Store,
  hooks: Deliveries,
  sub: Obj,
  changes: { quantity?: number; cancelAtPeriodEnd?: boolean; metadata?: Obj },
): Obj {
  if (sub.status === 'canceled') {
    throw invalid('A canceled subscription can only update its cancellation_details and metadata.');
  }
  const item = sub.items.data[0];
  const previous: Obj = {};
  if (changes.quantity !== undefined && changes.quantity !== item.quantity) {
    if (!Number.isInteger(changes.quantity) || changes.quantity < 1)
      throw invalid('Invalid quantity: must be at least 1', 'quantity');
    previous.items = structuredClone(sub.items);
    item.quantity = changes.quantity;
  }
  if (
    changes.cancelAtPeriodEnd !== undefined &&
    changes.cancelAtPeriodEnd !== sub.cancel_at_period_end
  ) {
    previous.cancel_at_period_end = sub.cancel_at_period_end;
    sub.cancel_at_period_end = changes.cancelAtPeriodEnd;
    sub.cancel_at = changes.cancelAtPeriodEnd ? item.current_period_end : null;
    sub.canceled_at = changes.cancelAtPeriodEnd ? store.now() : null;
    sub.cancellation_details.reason = changes.cancelAtPeriodEnd ? 'cancellation_requested' : null;
  }
  if (changes.metadata) Object.assign(sub.metadata, changes.metadata);
  if (Object.keys(previous).length > 0 || changes.metadata) {
    hooks.emit('customer.subscription.updated', sub, previous);
  }
  store.save();
  return sub;
}

/** End a subscription now: status canceled, ended_at set, deleted event sent. */
export function cancelNow(store: Store, hooks: Deliveries, sub: Obj): Obj {
  if (sub.status === 'canceled')
    throw invalid(`No such subscription: '${sub.id}' is already canceled`);
  const now = store.now();
  Object.assign(sub, { status: 'canceled', ended_at: now, canceled_at: sub.canceled_at ?? now });
  sub.cancellation_details.reason ??= 'cancellation_requested';
  hooks.emit('customer.subscription.deleted', sub);
  store.save();
  return sub;
}

/** Test helper: jump the clock to the end of the current period and do what falls due there. */
export function advancePeriod(store: Store, hooks: Deliveries, sub: Obj): Obj {
  const item = sub.items.data[0];
  const end = item.current_period_end;
  store.state.clockOffset += Math.max(0, end - store.now()) + 1;
  if (sub.status === 'canceled') return sub;
  if (sub.cancel_at_period_end) return cancelNow(store, hooks, sub);
  const previous = { status: sub.status };
  const wasPastDue = sub.status === 'past_due';
  if (!wasPastDue) {
    item.current_period_start = end;
    item.current_period_end = end + periodSeconds(item.price, end);
  }
  const invoice = createInvoice(store, sub, undefined, 'subscription_cycle');
  const paid = settleInvoice(store, hooks, sub, invoice, true);
  sub.status = paid ? 'active' : wasPastDue ? 'unpaid' : 'past_due';
  if (previous.status !== sub.status) hooks.emit('customer.subscription.updated', sub, previous);
  store.save();
  return sub;
}
