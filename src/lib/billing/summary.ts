import type { Db } from '../db/client';
import { seatsInUse } from '../data/invitations';
import type { Entitlement } from './entitlements';
import { entitlementFor } from './entitlements';
import { currentSubscription } from './seat-floor';

export interface BillingSummary {
  entitlement: Entitlement;
  seatsInUse: number;
  subscription: {
    id: string;
    status: string;
    seats: number;
    interval: 'month' | 'year';
    cancelAtPeriodEnd: boolean;
    currentPeriodEnd: string | null;
    trialEnd: string | null;
    endedAt: string | null;
  } | null;
}

/** What the billing page and GET /api/billing/summary show. */
export function billingSummary(db: Db, organisationId: string): BillingSummary {
  const sub = currentSubscription(db, organisationId);
  const iso = (d: Date | null): string | null => (d ? d.toISOString() : null);
  return {
    entitlement: entitlementFor(db, organisationId),
    seatsInUse: seatsInUse(organisationId),
    subscription: sub
      ? {
          id: sub.id,
          status: sub.status,
          seats: sub.seats,
          interval: sub.interval,
          cancelAtPeriodEnd: sub.cancelAtPeriodEnd,
          currentPeriodEnd: iso(sub.currentPeriodEnd),
          trialEnd: iso(sub.trialEnd),
          endedAt: iso(sub.endedAt),
        }
      : null,
  };
}
