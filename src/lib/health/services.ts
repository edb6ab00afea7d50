/**
 * Reachability of the hosted services through their SDKs (our fakes in dev and test): one cheap
 * authenticated read each, no retries, a short timeout. A key that the service recognises but
 * restricts (a sending-only e-mail key, a restricted payments key) counts as reachable.
 * Failures give a fixed reason; the error text goes only to the log, scrubbed.
 */
import { Resend } from 'resend';
import Stripe from 'stripe';
import { billingConfigured, getStripe } from '../billing/stripe-client';
import { logger } from '../server/logger';
import { elapsed } from './database';
import type { Outcome } from './types';

/** Per-check timeout: HEALTH_TIMEOUT_MS, default 2000. */
export function checkTimeoutMs(): number {
  const value = Number(process.env.HEALTH_TIMEOUT_MS);
  return Number.isFinite(value) && value > 0 ? value : 2000;
}

function failed(check: string, started: number, reason: string, detail?: unknown): Outcome {
  logger.warn({ check, reason, err: detail }, 'health check failed');
  return { status: 'failed', reason, ms: elapsed(started) };
}

/** E-mail: list one message. Required for sign-in, so an unset key is a failure. */
export async function checkEmail(): Promise<Outcome> {
  const started = performance.now();
  const key = process.env.RESEND_API_KEY;
  if (!key) return failed('email', started, 'not configured');
  const baseUrl = process.env.RESEND_BASE_URL || undefined;
  const resend = new Resend(key, baseUrl ? { baseUrl } : undefined);
  const timeout = checkTimeoutMs();
  try {
    const { error } = await resend.emails.list(
      { limit: 1 },
      { signal: AbortSignal.timeout(timeout) },
    );
    if (!error || error.name === 'restricted_api_key')
      return { status: 'ok', ms: elapsed(started) };
    if (/api_key/.test(error.name)) return failed('email', started, 'key refused', error.name);
    const slow = performance.now() - started >= timeout;
    return failed(
      'email',
      started,
      slow ? `no answer within ${timeout} ms` : 'unreachable',
      error.message,
    );
  } catch (error) {
    return failed('email', started, 'unreachable', error);
  }
}

/** Billing: list one invoice. Skipped when no payments key is configured (billing off). */
export async function checkBilling(): Promise<Outcome> {
  const started = performance.now();
  if (!billingConfigured()) return { status: 'skipped', reason: 'not configured', ms: 0 };
  const timeout = checkTimeoutMs();
  try {
    await getStripe().invoices.list({ limit: 1 }, { timeout, maxNetworkRetries: 0 });
    return { status: 'ok', ms: elapsed(started) };
  } catch (error) {
    if (error instanceof Stripe.errors.StripePermissionError)
      return { status: 'ok', ms: elapsed(started) };
    if (error instanceof Stripe.errors.StripeAuthenticationError)
      return failed('billing', started, 'key refused', error);
    if (error instanceof Stripe.errors.StripeConnectionError) {
      const slow = performance.now() - started >= timeout;
      return failed(
        'billing',
        started,
        slow ? `no answer within ${timeout} ms` : 'unreachable',
        error,
      );
    }
    return failed('billing', started, 'service error', error);
  }
}
