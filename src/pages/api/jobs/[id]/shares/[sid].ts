import type { APIRoute } from 'astro';
import { revokeShare } from '../../../../../lib/data/report-shares';
import { handle, notFound } from '../../../../../lib/jobs/http';
import { jobsViewer } from '../../../../../lib/jobs/viewer';

/** Revoke a report link: it stops working at once. */
export const DELETE: APIRoute = ({ locals, params }) =>
  handle(() => {
    // Revoking only narrows access, so read-only accounts may do it too.
    const viewer = jobsViewer(locals);
    if (!revokeShare(viewer.orgId, params.id ?? '', params.sid ?? '')) throw notFound('live link');
    return new Response(null, { status: 204 });
  });
