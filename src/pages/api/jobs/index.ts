import type { APIRoute } from 'astro';
import { createJob, listJobs } from '../../../lib/data/jobs';
import { handle, jsonBody, parseWith } from '../../../lib/jobs/http';
import { jobFieldsSchema, jobListQuerySchema, queryObject } from '../../../lib/jobs/schemas';
import { jobsViewer, jobsWriter } from '../../../lib/jobs/viewer';

/** A page of the organisation's jobs: ?q= search, ?status=, ?sort=, ?dir=, ?page=, ?pageSize=. */
export const GET: APIRoute = ({ locals, url }) =>
  handle(() => {
    const viewer = jobsViewer(locals);
    const query = parseWith(jobListQuerySchema, queryObject(url));
    return Response.json({ ...listJobs(viewer.orgId, query), canWrite: viewer.canWrite });
  });

/** Create a job. */
export const POST: APIRoute = ({ locals, request }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    const fields = parseWith(jobFieldsSchema, await jsonBody(request));
    return Response.json({ job: createJob(viewer.orgId, viewer.userId, fields) }, { status: 201 });
  });
