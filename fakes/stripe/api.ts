import {
  createCustomer,
  createPrice,
  createProduct,
  getCustomer,
  getPrice,
  listPrices,
  updateCustomer,
} from './catalogue';
import { createCheckoutSession, getSession, publicSession } from './checkout';
import type { FormObject } from './form';
import { list, metadata, str } from './form';
import type { Obj, Store } from './store';
import { StripeFakeError, invalid, listOf, missing, newId } from './store';
import { cancelNow, getSubscription, updateSubscription } from './subscriptions';
import type { Deliveries } from './webhooks';

export interface ApiContext {
  store: Store;
  hooks: Deliveries;
  publicUrl: string;
}

type Handler = (ctx: ApiContext, form: FormObject, params: string[]) => Obj;

/** The part of the payments API the app calls: [method, path pattern, handler]. */
const ROUTES: [string, RegExp, Handler][] = [
  ['POST', /^\/v1\/customers$/, (c, f) => createCustomer(c.store, f)],
  ['GET', /^\/v1\/customers\/([\w]+)$/, (c, _f, [id]) => getCustomer(c.store, id)],
  ['POST', /^\/v1\/customers\/([\w]+)$/, (c, f, [id]) => updateCustomer(c.store, id, f)],
  ['POST', /^\/v1\/products$/, (c, f) => createProduct(c.store, f)],
  [
    'GET',
    /^\/v1\/products\/([\w]+)$/,
    (c, _f, [id]) => c.store.state.products[id] ?? fail(missing('product', id)),
  ],
  ['POST', /^\/v1\/prices$/, (c, f) => createPrice(c.store, f)],
  ['GET', /^\/v1\/prices$/, (c, f) => listPrices(c.store, f)],
  ['GET', /^\/v1\/prices\/([\w]+)$/, (c, _f, [id]) => getPrice(c.store, id)],
  [
    'POST',
    /^\/v1\/checkout\/sessions$/,
    (c, f) => publicSession(createCheckoutSession(c.store, f, c.publicUrl)),
  ],
  [
    'GET',
    /^\/v1\/checkout\/sessions\/([\w]+)$/,
    (c, _f, [id]) => publicSession(getSession(c.store, id)),
  ],
  ['GET', /^\/v1\/subscriptions$/, (c, f) => listSubscriptions(c, f)],
  ['GET', /^\/v1\/subscriptions\/([\w]+)$/, (c, _f, [id]) => getSubscription(c.store, id)],
  ['POST', /^\/v1\/subscriptions\/([\w]+)$/, (c, f, [id]) => updateFromForm(c, id, f)],
  [
    'DELETE',
    /^\/v1\/subscriptions\/([\w]+)$/,
    (c, _f, [id]) => cancelNow(c.store, c.hooks, getSubscription(c.store, id)),
  ],
  ['POST', /^\/v1\/subscriptions\/([\w]+)\/resume$/, (c, _f, [id]) => resume(c, id)],
  ['POST', /^\/v1\/billing_portal\/sessions$/, (c, f) => createPortalSession(c, f)],
  ['GET', /^\/v1\/invoices$/, (c, f) => listInvoices(c, f)],
  [
    'GET',
    /^\/v1\/invoices\/([\w]+)$/,
    (c, _f, [id]) => invoiceView(c, c.store.state.invoices[id] ?? fail(missing('invoice', id))),
  ],
  [
    'GET',
    /^\/v1\/events\/([\w]+)$/,
    (c, _f, [id]) => c.store.state.events.find((e) => e.id === id) ?? fail(missing('event', id)),
  ],
];

function fail(error: StripeFakeError): never {
  throw error;
}

/** Route one API request; returns the status and JSON body Stripe would send. */
export function handleApi(
  ctx: ApiContext,
  method: string,
  pathname: string,
  form: FormObject,
  auth: string | undefined,
): { status: number; body: Obj } {
  if (!auth || !/^Bearer sk_\w+/.test(auth)) {
    const err = new StripeFakeError(
      401,
      'invalid_request_error',
      'You did not provide an API key. Provide it as a Bearer token.',
    );
    return { status: 401, body: err.body() };
  }
  try {
    for (const [m, pattern, handler] of ROUTES) {
      const match = m === method ? pattern.exec(pathname) : null;
      if (match) return { status: 200, body: handler(ctx, form, match.slice(1)) };
    }
    throw new StripeFakeError(
      404,
      'invalid_request_error',
      `Unrecognized request URL (${method}: ${pathname}).`,
    );
  } catch (error) {
    if (error instanceof StripeFakeError) return { status: error.status, body: error.body() };
    throw error;
  }
}

function updateFromForm(ctx: ApiContext, id: string, form: FormObject): Obj {
  const sub = getSubscription(ctx.store, id);
  const items = list(form, 'items');
  let quantity: number | undefined;
  if (items.length > 0) {
    const itemId = str(items[0], 'id');
    if (itemId && itemId !== sub.items.data[0].id)
      throw missing('subscription_item', itemId, 'items[0][id]');
    const q = str(items[0], 'quantity');
    if (q !== undefined) quantity = Number(q);
    if (quantity !== undefined && !Number.isInteger(quantity))
      throw invalid('Invalid integer: quantity', 'items[0][quantity]');
  }
  const cancel = str(form, 'cancel_at_period_end');
  const meta = metadata(form);
  return updateSubscription(ctx.store, ctx.hooks, sub, {
    quantity,
    cancelAtPeriodEnd: cancel === undefined ? undefined : cancel === 'true',
    metadata: Object.keys(meta).length > 0 ? meta : undefined,
  });
}

/** Resume: for a subscription set to end at the period's end, take the cancellation back. */
function resume(ctx: ApiContext, id: string): Obj {
  const sub = getSubscription(ctx.store, id);
  if (sub.status === 'canceled') throw invalid('A canceled subscription cannot be resumed.');
  return updateSubscription(ctx.store, ctx.hooks, sub, { cancelAtPeriodEnd: false });
}

function listSubscriptions(ctx: ApiContext, form: FormObject): Obj {
  const customer = str(form, 'customer');
  const data = Object.values(ctx.store.state.subscriptions)
    .filter((s) => !customer || s.customer === customer)
    .sort((a, b) => b.created - a.created);
  return listOf(data, '/v1/subscriptions');
}

function createPortalSession(ctx: ApiContext, form: FormObject): Obj {
  const customer = str(form, 'customer');
  if (!customer) throw invalid('Missing required param: customer.', 'customer');
  getCustomer(ctx.store, customer);
  const id = newId('bps');
  const session = {
    id,
    object: 'billing_portal.session',
    customer,
    return_url: str(form, 'return_url') ?? null,
    url: `${ctx.publicUrl}/portal/${id}`,
    created: ctx.store.now(),
    livemode: false,
  };
  ctx.store.state.portalSessions[id] = session;
  ctx.store.save();
  return session;
}

function invoiceView(ctx: ApiContext, invoice: Obj): Obj {
  return { ...invoice, hosted_invoice_url: `${ctx.publicUrl}/invoice/${invoice.id}` };
}

function listInvoices(ctx: ApiContext, form: FormObject): Obj {
  const customer = str(form, 'customer');
  const subscription = str(form, 'subscription');
  const limit = Math.min(Math.max(Number(str(form, 'limit') ?? '10') || 10, 1), 100);
  const all = Object.values(ctx.store.state.invoices)
    .filter((i) => !customer || i.customer === customer)
    .filter((i) => !subscription || i.parent?.subscription_details?.subscription === subscription)
    .sort((a, b) => b.created - a.created);
  return listOf(
    all.slice(0, limit).map((i) => invoiceView(ctx, i)),
    '/v1/invoices',
    all.length > limit,
  );
}
