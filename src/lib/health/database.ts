import type { Db } from './db/client';
import pkg from '../../package.json';

export type Health =
  | { status: 'ok'; version: string }
  | { status: 'unavailable'; version: string; reason: string };

/** App version from package.json, bundled at build time. */
export const APP_VERSION: string = pkg.version;

/** Ask the database a real question (how many migrations are applied) and report. */
export function checkHealth(getDb: () => Db): Health {
  try {
    const row = getDb().$client.prepare('SELECT count(*) AS n FROM __drizzle_migrations').get() as
      | { n: number }
      | undefined;
    if (!row || row.n < 1) {
      return { status: 'unavailable', version: APP_VERSION, reason: 'database has no migrations applied' };
    }
    return { status: 'ok', version: APP_VERSION };
  } catch {
    return { status: 'unavailable', version: APP_VERSION, reason: 'database did not answer' };
  }
}
