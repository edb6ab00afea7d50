import type { APIRoute } from 'astro';
import { listCalculations } from '../../../../lib/data/calculations';
import { deleteJob, getJob, updateJob } from '../../../../lib/data/jobs';
import { listShares } from '../../../../lib/data/report-shares';
import { handle, jsonBody, notFound, parseWith } from '../../../../lib/jobs/http';
import { jobPatchSchema } from '../../../../lib/jobs/schemas';
import { jobsViewer, jobsWriter } from '../../../../lib/jobs/viewer';

/** The job with its calculations (newest first) and its report links. */
export const GET: APIRoute = ({ locals, params }) =>
  handle(() => {
    const viewer = jobsViewer(locals);
    const job = getJob(viewer.orgId, params.id ?? '');
    if (!job) throw notFound();
    return Response.json({
      job,
      calculations: listCalculations(viewer.orgId, job.id),
      shares: listShares(viewer.orgId, job.id),
      canWrite: viewer.canWrite,
    });
  });

/** Change the job's fields. */
export const PATCH: APIRoute = ({ locals, params, request }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    if (!getJob(viewer.orgId, params.id ?? '')) throw notFound();
    const patch = parseWith(jobPatchSchema, await jsonBody(request));
    const job = updateJob(viewer.orgId, params.id ?? '', viewer.userId, patch);
    if (!job) throw notFound();
    return Response.json({ job });
  });

/** Delete the job and its calculations. */
export const DELETE: APIRoute = ({ locals, params }) =>
  handle(() => {
    const viewer = jobsWriter(locals);
    if (!deleteJob(viewer.orgId, params.id ?? '')) throw notFound();
    return new Response(null, { status: 204 });
  });
