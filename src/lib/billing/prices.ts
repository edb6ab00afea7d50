import type Stripe from 'stripe';
import type { BillingInterval } from './plans';
import { PRO_PRICES, PRO_PRODUCT } from './plans';

/** Price ids by interval, cached per client once found. */
const cache = new WeakMap<Stripe, Promise<Record<BillingInterval, string>>>();

/**
 * The Pro per-seat price ids, looked up by their lookup keys; on an account that has none yet
 * (a new test account, the local fake) the product and prices are created once.
 */
export function proPriceIds(stripe: Stripe): Promise<Record<BillingInterval, string>> {
  let found = cache.get(stripe);
  if (!found) {
    found = findOrCreate(stripe);
    found.catch(() => cache.delete(stripe));
    cache.set(stripe, found);
  }
  return found;
}

async function findOrCreate(stripe: Stripe): Promise<Record<BillingInterval, string>> {
  const specs = Object.values(PRO_PRICES);
  const existing = await stripe.prices.list({
    lookup_keys: specs.map((s) => s.lookupKey),
    active: true,
  });
  const byKey = new Map(existing.data.map((p) => [p.lookup_key, p]));
  let productId = existing.data[0] ? productOf(existing.data[0]) : undefined;
  const ids = {} as Record<BillingInterval, string>;
  for (const spec of specs) {
    const price = byKey.get(spec.lookupKey);
    if (price) {
      ids[spec.interval] = price.id;
      continue;
    }
    productId ??= (
      await stripe.products.create({ name: PRO_PRODUCT.name, description: PRO_PRODUCT.description })
    ).id;
    const created = await stripe.prices.create({
      product: productId,
      currency: spec.currency,
      unit_amount: spec.unitAmount,
      recurring: { interval: spec.interval },
      lookup_key: spec.lookupKey,
      nickname: `${PRO_PRODUCT.name} seat, per ${spec.interval}`,
    });
    ids[spec.interval] = created.id;
  }
  return ids;
}

function productOf(price: Stripe.Price): string {
  return typeof price.product === 'string' ? price.product : price.product.id;
}
