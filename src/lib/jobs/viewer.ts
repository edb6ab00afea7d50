import { allows, jobsEntitlement } from './entitlement';
import type { JobsNeed } from './entitlement';
import { HttpError } from './http';

export interface JobsViewer {
  orgId: string;
  userId: string;
  canWrite: boolean;
  /** The billing layer's notice for the owner (read-only, grace period), if any. */
  banner?: string;
}

function refusal(level: string): HttpError {
  return level === 'read_only'
    ? new HttpError(403, {
        error: 'read_only',
        message: 'This account is read-only: you can open and export jobs, but not change them. Restart the plan to save again.',
      })
    : new HttpError(403, { error: 'plan_required', message: 'Saved jobs need the Crew plan.' });
}

/**
 * The signed-in member, their organisation and what it may do with jobs. The middleware already
 * refuses visitors the route table does not allow; this also keeps endpoints safe if a route is
 * ever mis-declared.
 */
export function jobsViewer(locals: App.Locals, need: JobsNeed = 'read'): JobsViewer {
  if (!locals.user) throw new HttpError(401, { error: 'unauthorised', message: 'Sign in first.' });
  if (!locals.organisation || !locals.role) {
    throw new HttpError(403, { error: 'forbidden', message: 'Join an organisation first.' });
  }
  const e = jobsEntitlement(locals.organisation.id);
  if (!allows(e, need)) throw refusal(e.level);
  return { orgId: locals.organisation.id, userId: locals.user.id, canWrite: e.canWrite, banner: e.banner };
}

/** As jobsViewer for a change: refused with 403 read_only (or plan_required) unless full. */
export function jobsWriter(locals: App.Locals): JobsViewer {
  return jobsViewer(locals, 'write');
}
