import { getDb } from '../db/client';
import { entitlementFor } from './entitlements';

/**
 * Seats an organisation may fill (members plus open invitations): the seats paid for while the
 * plan allows changes, else none (free, lapsed or read-only organisations invite nobody).
 * Callers only use seatLimit(orgId).
 */
export function seatLimit(orgId: string): number {
  const entitlement = entitlementFor(getDb(), orgId);
  return entitlement.canWrite ? entitlement.seatsPaid : 0;
}
