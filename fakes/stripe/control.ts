import { checkCard } from './cards';
import type { FormObject } from './form';
import { replaceCard } from './invoices';
import { str } from './form';
import { portalPage } from './pages';
import type { Obj, Store } from './store';
import { StripeFakeError } from './store';
import { advancePeriod, cancelNow, getSubscription, updateSubscription } from './subscriptions';
import type { Deliveries } from './webhooks';

export type Reply = { status: number; type?: string; body: string; location?: string };

const json = (status: number, body: unknown): Reply => ({
  status,
  type: 'application/json',
  body: JSON.stringify(body),
});

/** Portal form posts: change seats, cancel (at period end or now), resume, pay with another card. */
export function portalAction(
  store: Store,
  hooks: Deliveries,
  portalId: string,
  action: string,
  form: FormObject,
): Reply {
  const session = store.state.portalSessions[portalId];
  if (!session) return { status: 404, type: 'text/html', body: portalPage(store, portalId) };
  try {
    const sub = getSubscription(store, str(form, 'subscription') ?? '');
    if (sub.customer !== session.customer)
      throw new StripeFakeError(403, 'invalid_request_error', 'Not your subscription.');
    if (action === 'seats') {
      const quantity = Number(str(form, 'quantity'));
      if (!Number.isInteger(quantity) || quantity < 1)
        throw new StripeFakeError(
          400,
          'invalid_request_error',
          'Enter a whole number of seats, at least 1.',
        );
      updateSubscription(store, hooks, sub, { quantity });
    } else if (action === 'cancel') {
      if (str(form, 'when') === 'now') cancelNow(store, hooks, sub);
      else updateSubscription(store, hooks, sub, { cancelAtPeriodEnd: true });
    } else if (action === 'resume') {
      updateSubscription(store, hooks, sub, { cancelAtPeriodEnd: false });
    } else if (action === 'card') {
      const card = checkCard(
        str(form, 'number') ?? '',
        str(form, 'expiry') ?? '',
        str(form, 'cvc') ?? '',
        store.now() * 1000,
      );
      if (!card.ok) throw new StripeFakeError(402, 'card_error', card.message);
      if (!replaceCard(store, hooks, sub, card))
        throw new StripeFakeError(402, 'card_error', 'The new card was declined too.');
    } else {
      return { status: 404, type: 'text/plain', body: 'Unknown portal action' };
    }
    return { status: 303, body: '', location: `/portal/${portalId}` };
  } catch (error) {
    if (!(error instanceof StripeFakeError)) throw error;
    return {
      status: error.status,
      type: 'text/html',
      body: portalPage(store, portalId, error.message),
    };
  }
}

/**
 * Test controls under /_fake (never part of the real API): delivery log, chaos switch, ending a
 * period, re-sending an event as a replay would.
 */
export function control(
  store: Store,
  hooks: Deliveries,
  method: string,
  pathname: string,
  body: Obj,
): Reply {
  if (method === 'GET' && pathname === '/_fake/deliveries') {
    return json(200, { pending: hooks.pending, deliveries: [...hooks.records.values()] });
  }
  if (method === 'POST' && pathname === '/_fake/config') {
    if (typeof body.chaos === 'boolean') hooks.config.chaos = body.chaos;
    if (typeof body.webhookUrl === 'string') hooks.config.url = body.webhookUrl;
    return json(200, { chaos: hooks.config.chaos, webhookUrl: hooks.config.url });
  }
  const advance = /^\/_fake\/subscriptions\/(\w+)\/advance$/.exec(pathname);
  if (method === 'POST' && advance) {
    try {
      return json(200, advancePeriod(store, hooks, getSubscription(store, advance[1])));
    } catch (error) {
      if (error instanceof StripeFakeError) return json(error.status, error.body());
      throw error;
    }
  }
  const resend = /^\/_fake\/events\/(\w+)\/resend$/.exec(pathname);
  if (method === 'POST' && resend) {
    const event = store.state.events.find((e) => e.id === resend[1]);
    if (!event)
      return json(404, { error: { type: 'invalid_request_error', message: 'No such event' } });
    hooks.resend(event);
    return json(200, { resent: event.id });
  }
  return json(404, {
    error: { type: 'invalid_request_error', message: `Unknown control ${method} ${pathname}` },
  });
}
