import { RateLimiterMemory } from 'rate-limiter-flexible';

/** Sign-in e-mails: a few per address (a person retrying), more per IP (a shared site office). */
const perAddress = new RateLimiterMemory({ keyPrefix: 'signin-email', points: 3, duration: 15 * 60 });
const perIp = new RateLimiterMemory({ keyPrefix: 'signin-ip', points: 10, duration: 15 * 60 });

/**
 * Count one sign-in e-mail against the address and the IP; resolves with the seconds to wait
 * when either budget is spent, else null. Per-process memory: enough for one server.
 */
export async function limitSignInEmail(email: string, ip: string): Promise<number | null> {
  const results = await Promise.allSettled([perIp.consume(ip), perAddress.consume(email)]);
  const refused = results.filter((r) => r.status === 'rejected');
  if (refused.length === 0) return null;
  const waits = refused.map((r) => Number((r.reason as { msBeforeNext?: number }).msBeforeNext) || 60_000);
  return Math.ceil(Math.max(...waits) / 1000);
}
