import { entitlementFor } from '../billing/entitlements';
import type { Entitlement } from '../billing/entitlements';
import { getDb } from '../db/client';

/**
 * Jobs ask the one entitlement check (src/lib/billing/entitlements.ts): full may change jobs;
 * read-only may open and export them; none (free plan) has no saved jobs to open. Export is
 * always allowed, so nobody is ever locked out of their own records.
 */
export type JobsNeed = 'read' | 'write' | 'export';

export function jobsEntitlement(orgId: string): Entitlement {
  return entitlementFor(getDb(), orgId);
}

export function allows(e: Entitlement, need: JobsNeed): boolean {
  if (need === 'export') return true;
  if (need === 'read') return e.level !== 'none';
  return e.canWrite;
}
