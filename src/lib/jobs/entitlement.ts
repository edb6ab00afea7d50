/**
 * What the current organisation may do with saved jobs. The one entitlement check lives in
 * src/lib/billing/entitlements.ts; this file only maps its answer onto job actions so every jobs
 * endpoint and page asks the same question.
 */
export type JobsLevel = 'full' | 'read_only' | 'none';

type Org = NonNullable<App.Locals['organisation']>;

/** The entitlement level for jobs (until billing answers: Pro plan = full, else read-only). */
export function jobsLevel(org: Org): JobsLevel {
  return org.plan === 'pro' ? 'full' : 'read_only';
}

/** Saving, editing, deleting, e-mailing and sharing need a full entitlement. */
export function canWriteJobs(org: Org): boolean {
  return jobsLevel(org) === 'full';
}
