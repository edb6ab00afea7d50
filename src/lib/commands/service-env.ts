import type { RunningFake } from '../../../fakes/runner';
import { FAKE_RESEND_KEY } from '../../../fakes/resend/spec';
import { FAKE_STRIPE_KEY, FAKE_STRIPE_WEBHOOK_SECRET } from '../../../fakes/stripe/spec';

/**
 * Environment that points each service SDK at its running fake, unless a real key is configured.
 * Each fake's issue adds its mapping here.
 */
export function serviceEnv(fakes: RunningFake[]): Record<string, string> {
  const env: Record<string, string> = {};
  const resend = fakes.find((f) => f.name === 'resend');
  const realResendKey = process.env.RESEND_API_KEY && !process.env.RESEND_API_KEY.startsWith('re_fake_');
  if (resend && !realResendKey) {
    env.RESEND_API_KEY = FAKE_RESEND_KEY;
    env.RESEND_BASE_URL = resend.url;
    env.FAKE_RESEND_URL = resend.url;
  }
  Object.assign(env, stripeEnv(fakes));
  return env;
}

/** Point the stripe SDK at the payments fake unless a real secret key is configured. */
function stripeEnv(fakes: RunningFake[]): Record<string, string> {
  const stripe = fakes.find((f) => f.name === 'stripe');
  const key = process.env.STRIPE_SECRET_KEY;
  if (!stripe || (key && key !== FAKE_STRIPE_KEY)) return {};
  return {
    STRIPE_SECRET_KEY: FAKE_STRIPE_KEY,
    STRIPE_API_HOST: '127.0.0.1',
    STRIPE_API_PORT: String(stripe.port),
    STRIPE_API_PROTOCOL: 'http',
    STRIPE_WEBHOOK_SECRET: process.env.STRIPE_WEBHOOK_SECRET || FAKE_STRIPE_WEBHOOK_SECRET,
    FAKE_STRIPE_URL: stripe.url,
  };
}
