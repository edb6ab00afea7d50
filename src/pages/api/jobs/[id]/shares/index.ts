import type { APIRoute } from 'astro';
import { z } from 'zod';
import { getJob } from '../../../../../lib/data/jobs';
import { createShare } from '../../../../../lib/data/report-shares';
import { handle, jsonBody, notFound, parseWith } from '../../../../../lib/jobs/http';
import { jobsWriter } from '../../../../../lib/jobs/viewer';

const body = z.strictObject({ days: z.number().int().min(1).max(90).default(30) });

/** Make a read-only link to the job's report; the answer carries the link once. */
export const POST: APIRoute = ({ locals, params, request, url }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    const job = getJob(viewer.orgId, params.id ?? '');
    if (!job) throw notFound();
    const { days } = parseWith(body, await jsonBody(request));
    const { share, token } = createShare(viewer.orgId, job.id, viewer.userId, days);
    return Response.json({ share, url: new URL(`/r/${token}`, url).toString() }, { status: 201 });
  });
