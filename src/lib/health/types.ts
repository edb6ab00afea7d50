/** One check's outcome as /api/health shows it. `reason` is a fixed phrase, never an error text. */
export interface CheckResult {
  status: 'ok' | 'failed' | 'skipped';
  /** A failed required check makes the endpoint answer 503. */
  required: boolean;
  /** Time the check took, in milliseconds. */
  ms: number;
  reason?: string;
}

export type CheckName = 'database' | 'email' | 'billing';

export interface HealthReport {
  /** ok: all passed; degraded: only optional checks failed (200); unavailable: 503. */
  status: 'ok' | 'degraded' | 'unavailable';
  version: string;
  checks: Record<CheckName, CheckResult>;
}

/** A check before `required` is decided: what it found and how long it took. */
export type Outcome = Omit<CheckResult, 'required'>;
