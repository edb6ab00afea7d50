import { eq } from 'drizzle-orm';
import { organisations } from '../../../db/schema';
import type { SubscriptionStatus } from '../../../db/schema';
import type { Db } from '../db/client';
import { getDb } from '../db/client';
import { GRACE_DAYS, GRANTED_SEATS, PLAN_NAMES } from './plans';
import { currentSubscription } from './seat-floor';

/**
 * THE place that decides what an organisation may do with Pro features. Every Pro endpoint and
 * page asks here on the server:
 * - trialing, active           → full
 * - past_due                   → full with a banner for GRACE_DAYS, then read-only
 * - canceled, unpaid, other    → read-only, export allowed (nothing is ever deleted)
 * - no subscription, free plan → none (no Pro features)
 * - no subscription, plan pro  → full with GRANTED_SEATS (demo or complimentary accounts)
 */
export type EntitlementLevel = 'full' | 'read_only' | 'none';

export interface Entitlement {
  level: EntitlementLevel;
  /** May create and change Pro data (jobs, reports, brand, invitations). */
  canWrite: boolean;
  /** May read and download what they have (also after a lapse). */
  canExport: boolean;
  /** Shown at the top of Pro pages when something needs the owner's attention. */
  banner?: string;
  /** Seats paid for (0 with no paid plan); invitations stop at this number. */
  seatsPaid: number;
  status: SubscriptionStatus | 'none' | 'granted';
  planName: string;
  /** When a past-due organisation turns read-only. */
  graceEndsAt?: Date;
}

const DAY_MS = 86_400_000;
const dateText = (d: Date): string => d.toISOString().slice(0, 10);

const READ_ONLY_BANNER =
  'Your Crew plan has ended. Everything is kept and you can read and export it; restart the plan to make changes.';

export function entitlementFor(
  db: Db,
  organisationId: string,
  now: Date = new Date(),
): Entitlement {
  const sub = currentSubscription(db, organisationId);
  const pro = PLAN_NAMES.pro;
  if (!sub) {
    const org = db
      .select({ plan: organisations.plan })
      .from(organisations)
      .where(eq(organisations.id, organisationId))
      .get();
    if (org?.plan === 'pro') {
      return {
        level: 'full',
        canWrite: true,
        canExport: true,
        seatsPaid: GRANTED_SEATS,
        status: 'granted',
        planName: pro,
      };
    }
    return {
      level: 'none',
      canWrite: false,
      canExport: false,
      seatsPaid: 0,
      status: 'none',
      planName: PLAN_NAMES.free,
    };
  }
  const base = { seatsPaid: sub.seats, status: sub.status, planName: pro };
  if (sub.status === 'trialing' || sub.status === 'active') {
    const ends = sub.cancelAtPeriodEnd && sub.currentPeriodEnd;
    const banner = ends
      ? `Your Crew plan is set to end on ${dateText(ends)}. You can keep it from the billing page.`
      : undefined;
    return {
      ...base,
      level: 'full',
      canWrite: true,
      canExport: true,
      ...(banner ? { banner } : {}),
    };
  }
  if (sub.status === 'past_due') {
    const graceEndsAt = new Date(
      (sub.pastDueSince ?? sub.syncedAt).getTime() + GRACE_DAYS * DAY_MS,
    );
    if (now < graceEndsAt) {
      const banner = `The last Crew payment failed. Update the card by ${dateText(graceEndsAt)} to keep making changes.`;
      return { ...base, level: 'full', canWrite: true, canExport: true, banner, graceEndsAt };
    }
    return {
      ...base,
      level: 'read_only',
      canWrite: false,
      canExport: true,
      banner: READ_ONLY_BANNER,
      graceEndsAt,
    };
  }
  if (sub.status === 'incomplete') {
    return {
      ...base,
      seatsPaid: 0,
      level: 'none',
      canWrite: false,
      canExport: false,
      planName: PLAN_NAMES.free,
    };
  }
  return {
    ...base,
    seatsPaid: 0,
    level: 'read_only',
    canWrite: false,
    canExport: true,
    banner: READ_ONLY_BANNER,
  };
}

/** What a route needs: to change Pro data, to read it, or to download it. */
export type ProNeed = 'write' | 'read' | 'export';

/** 403 JSON when the entitlement does not cover the need, else null. */
export function planRefusal(entitlement: Entitlement, need: ProNeed): Response | null {
  if (need === 'write' && entitlement.canWrite) return null;
  if (need === 'read' && entitlement.level !== 'none') return null;
  if (need === 'export' && entitlement.canExport) return null;
  const error = entitlement.level === 'read_only' ? 'read_only' : 'plan_required';
  const message =
    error === 'read_only'
      ? 'This organisation is read-only until its Crew plan is restarted. Reading and export still work.'
      : 'This needs the Crew plan.';
  return Response.json({ error, message }, { status: 403 });
}

/**
 * Guard for API routes: `const refused = requirePro(locals, 'write'); if (refused) return refused;`
 * Needs a current organisation (the route table's 'member' or 'owner' level ensures one).
 */
export function requirePro(
  locals: { organisation: { id: string } | null },
  need: ProNeed,
  db: Db = getDb(),
): Response | null {
  if (!locals.organisation)
    return Response.json({ error: 'plan_required', message: 'No organisation.' }, { status: 403 });
  return planRefusal(entitlementFor(db, locals.organisation.id), need);
}

/** What a granted plan is, in the owner's words: shown instead of a purchase form. */
export const GRANTED_TEXT = `Your ${PLAN_NAMES.pro} plan is granted: full use for ${GRANTED_SEATS} seats at no charge, with nothing to pay or renew. A paid plan is not needed and cannot be added on top of it; for more seats, ask the people who granted it.`;

/** Why the organisation may not start a checkout now (it already holds the plan), or null. */
export function checkoutRefusal(
  entitlement: Entitlement,
): { code: 'granted_plan' | 'already_subscribed'; message: string } | null {
  if (entitlement.status === 'granted') return { code: 'granted_plan', message: GRANTED_TEXT };
  if (['trialing', 'active', 'past_due'].includes(entitlement.status))
    return {
      code: 'already_subscribed',
      message: `This organisation already has a ${PLAN_NAMES.pro} plan; change seats instead.`,
    };
  return null;
}
