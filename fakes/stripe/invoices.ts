import type { Obj, Store } from './store';
import { listOf, newId } from './store';
import type { Deliveries } from './webhooks';

/** An invoice for the subscription's current period (amount from price × quantity unless given). */
export function createInvoice(
  store: Store,
  sub: Obj,
  amount: number | undefined,
  reason: string,
): Obj {
  const item = sub.items.data[0];
  const total = amount ?? item.price.unit_amount * item.quantity;
  const invoice: Obj = {
    id: newId('in'),
    object: 'invoice',
    customer: sub.customer,
    number: `DWF-${String(Object.keys(store.state.invoices).length + 1).padStart(4, '0')}`,
    status: 'open',
    currency: sub.currency,
    amount_due: total,
    amount_paid: 0,
    amount_remaining: total,
    total,
    subtotal: total,
    billing_reason: reason,
    created: store.now(),
    period_start: item.current_period_start,
    period_end: item.current_period_end,
    hosted_invoice_url: null,
    parent: {
      type: 'subscription_details',
      subscription_details: { subscription: sub.id, metadata: sub.metadata },
    },
    lines: listOf(
      [
        {
          id: newId('il'),
          object: 'line_item',
          amount: total,
          quantity: item.quantity,
          description: `${item.quantity} × seat`,
        },
      ],
      '/v1/invoices/lines',
    ),
    livemode: false,
  };
  store.state.invoices[invoice.id] = invoice;
  sub.latest_invoice = invoice.id;
  return invoice;
}

/** Try to collect an invoice with the subscription's card; emits paid or payment_failed. */
export function settleInvoice(
  store: Store,
  hooks: Deliveries,
  sub: Obj,
  invoice: Obj,
  charge: boolean,
): boolean {
  const card = store.state.paymentMethods[sub.default_payment_method];
  // A 'fail_later' card pays at sign-up and declines every charge after that.
  const later = invoice.billing_reason !== 'subscription_create';
  const ok = !charge || invoice.amount_due === 0 || !later || card?.behaviour !== 'fail_later';
  hooks.emit('invoice.created', invoice);
  if (ok) {
    Object.assign(invoice, {
      status: 'paid',
      amount_paid: invoice.amount_due,
      amount_remaining: 0,
    });
    hooks.emit('invoice.paid', invoice);
  } else {
    hooks.emit('invoice.payment_failed', invoice);
  }
  return ok;
}

/**
 * The portal's "pay with another card": the new card becomes the default and the open invoice is
 * charged again; paid brings a past-due or unpaid subscription back to active.
 */
export function replaceCard(
  store: Store,
  hooks: Deliveries,
  sub: Obj,
  card: { behaviour: string; last4: string; brand: string },
): boolean {
  const pm = {
    id: newId('pm'),
    object: 'payment_method',
    type: 'card',
    customer: sub.customer,
    card: { brand: card.brand, last4: card.last4 },
    behaviour: card.behaviour,
  };
  store.state.paymentMethods[pm.id] = pm;
  sub.default_payment_method = pm.id;
  const open = store.state.invoices[sub.latest_invoice];
  if (!open || open.status !== 'open') {
    store.save();
    return true;
  }
  const paid = card.behaviour !== 'fail_later';
  if (paid) {
    Object.assign(open, { status: 'paid', amount_paid: open.amount_due, amount_remaining: 0 });
    hooks.emit('invoice.paid', open);
    const previous = { status: sub.status };
    sub.status = 'active';
    hooks.emit('customer.subscription.updated', sub, previous);
  } else {
    hooks.emit('invoice.payment_failed', open);
  }
  store.save();
  return paid;
}
