import type { Db } from '../src/lib/db/client';
import { calculations, jobs, memberships, organisations, users } from './schema';
import { demoCalculations } from './seed-calculations';
import { seedFlags } from './seed-flags';

/**
 * The demo scenario: an invented dewatering firm, its crew, our support desk and a free user.
 * Every name, address and client here is fictional. Fixed ids make the seed idempotent.
 */
export const DEMO_USERS = [
  { id: 'usr_demo_owner', email: 'rosa@heronsgate.example', name: 'Rosa Delgado', role: 'owner' },
  { id: 'usr_demo_crew1', email: 'tomas@heronsgate.example', name: 'Tomas Berg', role: 'member' },
  { id: 'usr_demo_crew2', email: 'ana@heronsgate.example', name: 'Ana Okafor', role: 'member' },
  { id: 'usr_demo_support', email: 'desk@drainwright.example', name: 'Sam Reyes', role: 'support' },
  { id: 'usr_demo_free', email: 'lee@pondkeeper.example', name: 'Lee Park', role: 'free' },
] as const;

export const DEMO_ORG_ID = 'org_demo_heronsgate';
const FREE_ORG_ID = 'org_demo_lee';
const T0 = Date.UTC(2026, 10, 2, 8, 0, 0);

const DEMO_JOBS = [
  {
    id: 'job_demo_koi',
    title: 'Drain the koi pond before relining',
    client: 'Willowmere Gardens Ltd',
    siteAddress: '14 Quarry Lane, Millbrook',
    notes: 'Fish moved to holding tanks first. Discharge to the swale on the east side, not the road drain.',
    status: 'on_site',
  },
  {
    id: 'job_demo_basement',
    title: 'Basement flood pump-out by gravity',
    client: 'J. and P. Carter',
    siteAddress: '3 Fenwick Row, Ashby Dale',
    notes: 'Garden slopes 2.4 m below the basement floor at the back fence.',
    status: 'quoted',
  },
  {
    id: 'job_demo_tank',
    title: 'Decommission the rainwater tank',
    client: 'Old Mill Farm',
    siteAddress: 'Old Mill Farm, Brackenridge Road',
    notes: 'Empty by siphon over the tank wall into the irrigation ditch.',
    status: 'scoping',
  },
] as const;

/** Insert the demo scenario; running it again changes nothing. */
export function seedDemo(db: Db): void {
  db.transaction((tx) => {
    tx.insert(organisations)
      .values([
        { id: DEMO_ORG_ID, name: 'Heronsgate Dewatering Co.', plan: 'pro', createdAt: new Date(T0) },
        { id: FREE_ORG_ID, name: 'Lee Park', plan: 'free', personal: true, createdAt: new Date(T0) },
      ])
      .onConflictDoNothing()
      .run();
    for (const u of DEMO_USERS) {
      tx.insert(users)
        .values({
          id: u.id,
          email: u.email,
          name: u.name,
          staffRole: u.role === 'support' ? 'support' : null,
          createdAt: new Date(T0),
        })
        .onConflictDoNothing()
        .run();
      const orgId = u.role === 'owner' || u.role === 'member' ? DEMO_ORG_ID : u.role === 'free' ? FREE_ORG_ID : null;
      if (!orgId) continue;
      const role = u.role === 'member' ? 'member' : 'owner';
      tx.insert(memberships)
        .values({ organisationId: orgId, userId: u.id, role, createdAt: new Date(T0) })
        .onConflictDoNothing()
        .run();
    }
    DEMO_JOBS.forEach((job, i) => {
      const at = new Date(T0 + i * 86_400_000);
      tx.insert(jobs)
        .values({ ...job, organisationId: DEMO_ORG_ID, createdBy: 'usr_demo_owner', updatedBy: 'usr_demo_owner', createdAt: at, updatedAt: at })
        .onConflictDoNothing()
        .run();
    });
    for (const calc of demoCalculations()) {
      tx.insert(calculations)
        .values({ ...calc, organisationId: DEMO_ORG_ID, createdBy: 'usr_demo_crew1', createdAt: new Date(T0) })
        .onConflictDoNothing()
        .run();
    }
  });
  seedFlags(db);
}
