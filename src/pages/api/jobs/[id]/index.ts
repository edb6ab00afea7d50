import type { APIRoute } from 'astro';
import { listCalculations } from '../../../../lib/data/calculations';
import { deleteJob, getJob, updateJob } from '../../../../lib/data/jobs';
import { listShares } from '../../../../lib/data/report-shares';
import { handle, jsonBody, notFound, parseWith, staleEdit } from '../../../../lib/jobs/http';
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

/** Change the job's fields, if nobody saved it since the editor loaded `revision`. */
export const PATCH: APIRoute = ({ locals, params, request }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    if (!getJob(viewer.orgId, params.id ?? '')) throw notFound();
    const { revision, ...patch } = parseWith(jobPatchSchema, await jsonBody(request));
    const r = updateJob(viewer.orgId, params.id ?? '', viewer.userId, patch, revision);
    if (r.kind === 'missing') throw notFound();
    if (r.kind === 'stale') return Response.json(staleEdit(r.current), { status: 409 });
    return Response.json({ job: r.job });
  });

/** Delete the job and its calculations. */
export const DELETE: APIRoute = ({ locals, params }) =>
  handle(() => {
    const viewer = jobsWriter(locals);
    if (!deleteJob(viewer.orgId, params.id ?? '')) throw notFound();
    return new Response(null, { status: 204 });
  });
