import type { APIRoute } from 'astro';
import { getDb } from '../../../lib/db/client';
import {
  BillingUnavailableError,
  getStripe,
  webhookSecret,
} from '../../../lib/billing/stripe-client';
import { processEvent } from '../../../lib/billing/webhook';

/**
 * Payment events, signed by the payments service. A bad signature gets 400 and nothing else
 * happens; a repeated event id gets 200 and changes nothing; a failure to apply gets 500 so the
 * sender retries.
 */
export const POST: APIRoute = async ({ request }) => {
  const signature = request.headers.get('stripe-signature');
  if (!signature) return Response.json({ error: 'missing_signature' }, { status: 400 });
  let stripe;
  let secret;
  try {
    stripe = getStripe();
    secret = webhookSecret();
  } catch (error) {
    if (error instanceof BillingUnavailableError)
      return Response.json({ error: 'billing_unavailable' }, { status: 503 });
    throw error;
  }
  const payload = await request.text();
  let event;
  try {
    event = stripe.webhooks.constructEvent(payload, signature, secret);
  } catch {
    return Response.json({ error: 'bad_signature' }, { status: 400 });
  }
  try {
    const outcome = await processEvent(getDb(), stripe, event);
    return Response.json({ received: true, outcome });
  } catch (error) {
    console.error(
      `webhook ${event.id} (${event.type}) not applied:`,
      error instanceof Error ? error.message : error,
    );
    return Response.json({ error: 'not_applied' }, { status: 500 });
  }
};
