/**
 * Coarse deadlines for many short waits. A timer of its own per request body cost about a
 * twentieth of an API call (insert and remove in Node's timer lists); one sweep every
 * SWEEP_MS checks them all instead, so a deadline fires up to SWEEP_MS late.
 */

export const SWEEP_MS = 250;

const pending = new Map<() => void, number>();
let sweeper: NodeJS.Timeout | undefined;

function sweep(): void {
  const now = performance.now();
  for (const [expire, at] of pending) {
    if (at <= now) {
      pending.delete(expire);
      expire();
    }
  }
  if (pending.size === 0) {
    clearInterval(sweeper);
    sweeper = undefined;
  }
}

/** Call `expire` once, about `ms` from now, unless the returned cancel runs first. */
export function deadline(ms: number, expire: () => void): () => void {
  pending.set(expire, performance.now() + ms);
  sweeper ??= setInterval(sweep, SWEEP_MS).unref();
  return () => void pending.delete(expire);
}
