import path from 'node:path';
import Database from 'better-sqlite3';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';

/**
 * The real app (npm start, seeded demo) plus direct database access for what sign-in would do:
 * sessions are Auth.js database-session rows, so a test signs a user in by inserting one and
 * sending its cookie, exactly as the middleware reads it.
 */
export interface JobsApp {
  app: StartedApp;
  db: Database.Database;
  /** Headers for a signed-in request as this user (with the app's Origin for writes). */
  as: (userId: string) => Record<string, string>;
}

export async function startJobsApp(port: number): Promise<JobsApp> {
  const app = await startApp(port);
  const db = new Database(path.join(app.dataDir, 'drainwright.sqlite'));
  const now = Date.now();
  // A second Pro organisation (for cross-organisation checks) and a lapsed one (read-only).
  db.exec(`
    insert into organisations (id, name, plan, personal, created_at) values
      ('org_t_other', 'Other Firm', 'pro', 0, ${now}), ('org_t_lapsed', 'Lapsed Firm', 'pro', 0, ${now});
    insert into users (id, email, name, created_at) values
      ('usr_t_other', 'o@other.test', 'Other', ${now}), ('usr_t_lapsed', 'l@lapsed.test', 'Lapsed', ${now});
    insert into memberships (organisation_id, user_id, role, created_at) values
      ('org_t_other', 'usr_t_other', 'owner', ${now}), ('org_t_lapsed', 'usr_t_lapsed', 'owner', ${now});
    insert into jobs (id, organisation_id, title, client, site_address, notes, status, created_at, updated_at) values
      ('job_t_other', 'org_t_other', 'Their job', 'X', 'Y', '', 'scoping', ${now}, ${now}),
      ('job_t_lapsed', 'org_t_lapsed', 'Old job', 'Z', 'W', '', 'quoted', ${now}, ${now});
    insert into subscriptions (id, organisation_id, customer_id, status, price_id, item_id, interval, seats,
      cancel_at_period_end, started_at, synced_at) values
      ('sub_t_lapsed', 'org_t_lapsed', 'cus_t', 'canceled', 'price_t', 'si_t', 'month', 3, 0, ${now - 1e9}, ${now});
  `);
  const as = (userId: string): Record<string, string> => {
    const token = `test-${userId}-${'x'.repeat(24)}`;
    db.prepare('insert or replace into sessions (session_token, user_id, expires) values (?, ?, ?)').run(token, userId, now + 86_400_000);
    return { cookie: `authjs.session-token=${token}`, origin: app.url };
  };
  return { app, db, as };
}
