import type { FormObject } from './form';
import { metadata, str, sub } from './form';
import type { Obj, Store } from './store';
import { invalid, listOf, missing, newId } from './store';

/** Customers, products and prices: plain records the other parts refer to. */
export function createCustomer(store: Store, form: FormObject): Obj {
  const customer: Obj = {
    id: newId('cus'),
    object: 'customer',
    created: store.now(),
    email: str(form, 'email') ?? null,
    name: str(form, 'name') ?? null,
    description: str(form, 'description') ?? null,
    metadata: metadata(form),
    livemode: false,
    invoice_settings: { default_payment_method: null },
    currency: null,
    delinquent: false,
  };
  store.state.customers[customer.id] = customer;
  store.save();
  return customer;
}

export function updateCustomer(store: Store, id: string, form: FormObject): Obj {
  const customer = getCustomer(store, id);
  for (const key of ['email', 'name', 'description']) {
    const v = str(form, key);
    if (v !== undefined) customer[key] = v;
  }
  Object.assign(customer.metadata, metadata(form));
  store.save();
  return customer;
}

export function getCustomer(store: Store, id: string): Obj {
  const customer = store.state.customers[id];
  if (!customer) throw missing('customer', id);
  return customer;
}

export function createProduct(store: Store, form: FormObject): Obj {
  const name = str(form, 'name');
  if (!name) throw invalid('Missing required param: name.', 'name');
  const product: Obj = {
    id: str(form, 'id') ?? newId('prod'),
    object: 'product',
    active: true,
    name,
    description: str(form, 'description') ?? null,
    metadata: metadata(form),
    created: store.now(),
    livemode: false,
  };
  store.state.products[product.id] = product;
  store.save();
  return product;
}

export function createPrice(store: Store, form: FormObject): Obj {
  const product = str(form, 'product');
  if (!product || !store.state.products[product])
    throw missing('product', product ?? '', 'product');
  const amount = Number(str(form, 'unit_amount'));
  if (!Number.isInteger(amount) || amount < 0)
    throw invalid('Invalid integer: unit_amount', 'unit_amount');
  const interval = str(sub(form, 'recurring'), 'interval');
  if (interval && !['day', 'week', 'month', 'year'].includes(interval)) {
    throw invalid('Invalid recurring[interval]', 'recurring[interval]');
  }
  const lookupKey = str(form, 'lookup_key') ?? null;
  if (lookupKey) {
    for (const p of Object.values(store.state.prices))
      if (p.lookup_key === lookupKey) p.lookup_key = null;
  }
  const price: Obj = {
    id: newId('price'),
    object: 'price',
    active: true,
    currency: (str(form, 'currency') ?? 'usd').toLowerCase(),
    unit_amount: amount,
    product,
    lookup_key: lookupKey,
    nickname: str(form, 'nickname') ?? null,
    recurring: interval ? { interval, interval_count: 1, usage_type: 'licensed' } : null,
    type: interval ? 'recurring' : 'one_time',
    billing_scheme: 'per_unit',
    metadata: metadata(form),
    created: store.now(),
    livemode: false,
  };
  store.state.prices[price.id] = price;
  store.save();
  return price;
}

export function getPrice(store: Store, id: string): Obj {
  const price = store.state.prices[id];
  if (!price) throw missing('price', id, 'price');
  return price;
}

/** GET /v1/prices with lookup_keys[], active and product filters; `expand[]=data.product`. */
export function listPrices(store: Store, query: FormObject): Obj {
  const keys = Array.isArray(query.lookup_keys) ? (query.lookup_keys as string[]) : [];
  const product = str(query, 'product');
  const expandProduct = JSON.stringify(query.expand ?? '').includes('data.product');
  const data = Object.values(store.state.prices)
    .filter((p) => keys.length === 0 || keys.includes(p.lookup_key))
    .filter((p) => !product || p.product === product)
    .filter((p) => str(query, 'active') === undefined || String(p.active) === str(query, 'active'))
    .map((p) => (expandProduct ? { ...p, product: store.state.products[p.product] } : p));
  return listOf(data, '/v1/prices');
}
