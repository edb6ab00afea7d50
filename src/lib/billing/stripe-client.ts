import Stripe from 'stripe';

/**
 * The payments SDK, configured from the environment alone: STRIPE_SECRET_KEY, and for the local
 * fake STRIPE_API_HOST / STRIPE_API_PORT / STRIPE_API_PROTOCOL. Production sets only the keys.
 */
export class BillingUnavailableError extends Error {
  constructor() {
    super('Billing is not configured on this server (no STRIPE_SECRET_KEY).');
  }
}

let cached: { signature: string; client: Stripe } | undefined;

export function billingConfigured(): boolean {
  return Boolean(process.env.STRIPE_SECRET_KEY);
}

export function getStripe(): Stripe {
  const key = process.env.STRIPE_SECRET_KEY;
  if (!key) throw new BillingUnavailableError();
  const host = process.env.STRIPE_API_HOST || undefined;
  const port = process.env.STRIPE_API_PORT ? Number(process.env.STRIPE_API_PORT) : undefined;
  const protocol = process.env.STRIPE_API_PROTOCOL === 'http' ? 'http' : undefined;
  const signature = [key, host, port, protocol].join('|');
  if (cached?.signature !== signature) {
    const client = new Stripe(key, {
      ...(host ? { host } : {}),
      ...(port ? { port } : {}),
      ...(protocol ? { protocol } : {}),
      maxNetworkRetries: 2,
      timeout: 20_000,
      appInfo: { name: 'Drainwright' },
    });
    cached = { signature, client };
  }
  return cached.client;
}

/** The webhook signing secret (STRIPE_WEBHOOK_SECRET). */
export function webhookSecret(): string {
  const secret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new BillingUnavailableError();
  return secret;
}
