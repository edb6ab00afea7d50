import type { Db } from '../db/client';
import type { Outcome } from './types';

/** Ask the database a real question (how many migrations are applied). */
export function checkDatabase(getDb: () => Db): Outcome {
  const started = performance.now();
  const done = (o: Omit<Outcome, 'ms'>): Outcome => ({ ...o, ms: elapsed(started) });
  try {
    const row = getDb().$client.prepare('SELECT count(*) AS n FROM __drizzle_migrations').get() as
      { n: number } | undefined;
    if (!row || row.n < 1) return done({ status: 'failed', reason: 'no migrations applied' });
    return done({ status: 'ok' });
  } catch (error) {
    const empty = error instanceof Error && /no such table/.test(error.message);
    return done({ status: 'failed', reason: empty ? 'no migrations applied' : 'did not answer' });
  }
}

/** Milliseconds since `started`, to 0.1 ms. */
export function elapsed(started: number): number {
  return Math.round((performance.now() - started) * 10) / 10;
}
