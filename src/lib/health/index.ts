/**
 * /api/health: the database on every call, the hosted services at most once per
 * HEALTH_SERVICE_TTL_MS (default 10 s, so a load balancer polling every few seconds does not
 * turn into a stream of calls to them), with concurrent calls sharing one round of checks.
 * Every check is required unless named in HEALTH_OPTIONAL (comma list, e.g. "billing").
 */
import pkg from '../../../package.json';
import type { Db } from '../db/client';
import { checkDatabase } from './database';
import { checkBilling, checkEmail } from './services';
import type { CheckName, CheckResult, HealthReport, Outcome } from './types';

export type { CheckResult, HealthReport } from './types';
export { checkDatabase } from './database';

/** App version from package.json, bundled at build time. */
export const APP_VERSION: string = pkg.version;

type Services = { email: Outcome; billing: Outcome };
let cached: { at: number; services: Promise<Services> } | undefined;

function ttlMs(): number {
  const value = Number(process.env.HEALTH_SERVICE_TTL_MS);
  return Number.isFinite(value) && value >= 0 ? value : 10_000;
}

function services(): Promise<Services> {
  const now = Date.now();
  if (!cached || now - cached.at > ttlMs()) {
    const round = Promise.all([checkEmail(), checkBilling()]).then(([email, billing]) => ({
      email,
      billing,
    }));
    cached = { at: now, services: round };
  }
  return cached.services;
}

function optional(): Set<string> {
  return new Set(
    (process.env.HEALTH_OPTIONAL ?? '')
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean),
  );
}

/** Run every check and decide the overall status. */
export async function healthReport(getDb: () => Db): Promise<HealthReport> {
  const database = checkDatabase(getDb);
  const { email, billing } = await services();
  const soft = optional();
  const withRequired = (name: CheckName, o: Outcome): CheckResult => ({
    status: o.status,
    required: o.status !== 'skipped' && !soft.has(name),
    ms: o.ms,
    ...(o.reason ? { reason: o.reason } : {}),
  });
  const checks = {
    database: withRequired('database', database),
    email: withRequired('email', email),
    billing: withRequired('billing', billing),
  };
  const failures = Object.values(checks).filter((c) => c.status === 'failed');
  const status = failures.some((c) => c.required)
    ? 'unavailable'
    : failures.length
      ? 'degraded'
      : 'ok';
  return { status, version: APP_VERSION, checks };
}
