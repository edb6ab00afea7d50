/**
 * Per-client rate limit of the public API (rate-limiter-flexible, in memory: one server process).
 * CALC_RATE_LIMIT_PER_MINUTE (default 120) is read at every request, so a server started with a
 * different value, or a test changing it, takes effect at once; 0 turns the limit off (bench).
 */
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { intFromEnv } from '../config';
import type { ApiAnswer } from './answer';
import { rateLimited } from './errors';

export const DEFAULT_RATE_LIMIT_PER_MINUTE = 120;

let current: { points: number; limiter: RateLimiterMemory } | undefined;

/** Requests per minute allowed per client address; 0 means no limit. */
export function rateLimitPerMinute(): number {
  const n = intFromEnv('CALC_RATE_LIMIT_PER_MINUTE', DEFAULT_RATE_LIMIT_PER_MINUTE);
  return n >= 0 ? n : DEFAULT_RATE_LIMIT_PER_MINUTE;
}

function limiterFor(points: number): RateLimiterMemory {
  if (current?.points !== points) {
    current = { points, limiter: new RateLimiterMemory({ points, duration: 60 }) };
  }
  return current.limiter;
}

/**
 * Count one request from this client: the 429 answer when it is over the limit, else null.
 * Plain null, not a promise, when the limit is off.
 */
export function checkRateLimit(clientKey: string): Promise<ApiAnswer | null> | null {
  const points = rateLimitPerMinute();
  if (points === 0) return null;
  return limiterFor(points)
    .consume(clientKey)
    .then(
      () => null,
      (rejection: unknown) => {
        if (!(rejection instanceof RateLimiterRes)) throw rejection;
        return rateLimited(Math.max(1, Math.ceil(rejection.msBeforeNext / 1000)));
      },
    );
}
