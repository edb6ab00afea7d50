import { canWriteJobs } from './entitlement';
import { HttpError } from './http';

export interface JobsViewer {
  orgId: string;
  userId: string;
  canWrite: boolean;
}

/**
 * The signed-in member and their organisation. The middleware already refuses visitors the route
 * table does not allow; this keeps endpoints safe if a route is ever mis-declared.
 */
export function jobsViewer(locals: App.Locals): JobsViewer {
  if (!locals.user) throw new HttpError(401, { error: 'unauthorised', message: 'Sign in first.' });
  if (!locals.organisation || !locals.role) {
    throw new HttpError(403, { error: 'forbidden', message: 'Join an organisation first.' });
  }
  return { orgId: locals.organisation.id, userId: locals.user.id, canWrite: canWriteJobs(locals.organisation) };
}

/** As jobsViewer, and refuse with 403 read_only when the organisation may not change jobs. */
export function jobsWriter(locals: App.Locals): JobsViewer {
  const v = jobsViewer(locals);
  if (!v.canWrite) {
    throw new HttpError(403, {
      error: 'read_only',
      message: 'This account is read-only: you can open and export jobs, but not change them. Renew Pro to save again.',
    });
  }
  return v;
}
