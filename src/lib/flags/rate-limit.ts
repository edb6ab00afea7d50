import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { intFromEnv } from '../config';

let limiter: RateLimiterMemory | undefined;

/** Flags per IP address per window; FLAGS_PER_WINDOW and FLAG_WINDOW_SECONDS override. */
function flagLimiter(): RateLimiterMemory {
  limiter ??= new RateLimiterMemory({
    keyPrefix: 'flags',
    points: intFromEnv('FLAGS_PER_WINDOW', 10),
    duration: intFromEnv('FLAG_WINDOW_SECONDS', 15 * 60),
  });
  return limiter;
}

/** Spend one flag for this address; returns seconds to wait when over the limit, else null. */
export async function takeFlagPoint(ip: string): Promise<number | null> {
  try {
    await flagLimiter().consume(ip);
    return null;
  } catch (err) {
    if (err instanceof RateLimiterRes) return Math.max(1, Math.ceil(err.msBeforeNext / 1000));
    throw err;
  }
}
