import { checkCard } from './cards';
import type { FormObject } from './form';
import { list, metadata, str, sub } from './form';
import { getCustomer, getPrice } from './catalogue';
import type { Obj, Store } from './store';
import { invalid, missing, newId } from './store';
import { startSubscription } from './subscriptions';
import type { Deliveries } from './webhooks';

/** POST /v1/checkout/sessions in subscription mode: one recurring price with a seat quantity. */
export function createCheckoutSession(store: Store, form: FormObject, publicUrl: string): Obj {
  if (str(form, 'mode') !== 'subscription')
    throw invalid('This fake supports only mode=subscription.', 'mode');
  const successUrl = str(form, 'success_url');
  if (!successUrl) throw invalid('Missing required param: success_url.', 'success_url');
  const items = list(form, 'line_items');
  if (items.length !== 1) throw invalid('Exactly one line item is supported.', 'line_items');
  const price = getPrice(store, str(items[0], 'price') ?? '');
  if (!price.recurring)
    throw invalid('The price must be recurring in subscription mode.', 'line_items[0][price]');
  const quantity = Number(str(items[0], 'quantity') ?? '1');
  if (!Number.isInteger(quantity) || quantity < 1)
    throw invalid('Invalid quantity.', 'line_items[0][quantity]');
  const customerId = str(form, 'customer');
  if (customerId) getCustomer(store, customerId);
  const data = sub(form, 'subscription_data');
  const id = newId('cs_test');
  const now = store.now();
  const session: Obj = {
    id,
    object: 'checkout.session',
    mode: 'subscription',
    status: 'open',
    payment_status: 'unpaid',
    customer: customerId ?? null,
    customer_email: str(form, 'customer_email') ?? null,
    client_reference_id: str(form, 'client_reference_id') ?? null,
    subscription: null,
    success_url: successUrl,
    cancel_url: str(form, 'cancel_url') ?? null,
    url: `${publicUrl}/pay/${id}`,
    metadata: metadata(form),
    created: now,
    expires_at: now + 86_400,
    amount_total: price.unit_amount * quantity,
    currency: price.currency,
    livemode: false,
    _line: { price: price.id, quantity },
    _subscription_data: {
      trial_days: Number(str(data, 'trial_period_days') ?? '0'),
      metadata: metadata(data),
    },
  };
  store.state.checkoutSessions[id] = session;
  store.save();
  return session;
}

/** The session as the API returns it (without the fake's private fields). */
export function publicSession(session: Obj): Obj {
  const { _line, _subscription_data, ...rest } = session; // eslint-disable-line @typescript-eslint/no-unused-vars
  return rest;
}

export function getSession(store: Store, id: string): Obj {
  const session = store.state.checkoutSessions[id];
  if (!session) throw missing('checkout.session', id);
  return session;
}

/**
 * The hosted form was submitted: check the card, then create the customer (when needed), the
 * subscription and the session's completion event. Returns the redirect or the card's error.
 */
export function payCheckout(
  store: Store,
  hooks: Deliveries,
  session: Obj,
  card: { number: string; expiry: string; cvc: string; email: string; name: string },
): { redirect: string } | { error: string } {
  if (session.status !== 'open')
    return { error: 'This checkout page has already been used or has expired.' };
  const outcome = checkCard(card.number, card.expiry, card.cvc, store.now() * 1000);
  if (!outcome.ok) return { error: outcome.message };
  let customerId: string = session.customer;
  if (!customerId) {
    customerId = newId('cus');
    store.state.customers[customerId] = {
      id: customerId,
      object: 'customer',
      created: store.now(),
      email: card.email || session.customer_email,
      name: card.name || null,
      metadata: {},
      livemode: false,
      invoice_settings: { default_payment_method: null },
    };
  }
  const pm = {
    id: newId('pm'),
    object: 'payment_method',
    type: 'card',
    customer: customerId,
    card: { brand: outcome.brand, last4: outcome.last4 },
    behaviour: outcome.behaviour,
  };
  store.state.paymentMethods[pm.id] = pm;
  store.state.customers[customerId].invoice_settings.default_payment_method = pm.id;
  const line = session._line;
  const subscription = startSubscription(store, hooks, {
    customer: customerId,
    price: getPrice(store, line.price),
    quantity: line.quantity,
    trialDays: session._subscription_data.trial_days,
    metadata: session._subscription_data.metadata,
    paymentMethod: pm.id,
  });
  Object.assign(session, {
    status: 'complete',
    payment_status: subscription.status === 'trialing' ? 'no_payment_required' : 'paid',
    customer: customerId,
    subscription: subscription.id,
  });
  hooks.emit('checkout.session.completed', publicSession(session));
  store.save();
  return { redirect: session.success_url.replace('{CHECKOUT_SESSION_ID}', session.id) };
}
