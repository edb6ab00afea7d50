import type { APIRoute } from 'astro';
import { addCalculation, getCalculation, listCalculations } from '../../../../../lib/data/calculations';
import { getJob } from '../../../../../lib/data/jobs';
import { handle, invalid, jsonBody, notFound, parseWith } from '../../../../../lib/jobs/http';
import { runCalculation } from '../../../../../lib/jobs/run-calculation';
import { calculationCreateSchema } from '../../../../../lib/jobs/schemas';
import { jobsViewer, jobsWriter } from '../../../../../lib/jobs/viewer';

/** The job's calculations, newest first. */
export const GET: APIRoute = ({ locals, params }) =>
  handle(() => {
    const viewer = jobsViewer(locals);
    const job = getJob(viewer.orgId, params.id ?? '');
    if (!job) throw notFound();
    return Response.json({ calculations: listCalculations(viewer.orgId, job.id) });
  });

/**
 * Save a calculation: the inputs are run on the current engine, and its results (not the
 * client's) are stored with the engine version. revisionOf names the calculation this revises.
 */
export const POST: APIRoute = ({ locals, params, request }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    const job = getJob(viewer.orgId, params.id ?? '');
    if (!job) throw notFound();
    const body = parseWith(calculationCreateSchema, await jsonBody(request));
    if (body.revisionOf && !getCalculation(viewer.orgId, job.id, body.revisionOf)) {
      throw invalid([{ path: 'revisionOf', message: 'is not a calculation of this job' }]);
    }
    const run = runCalculation(body.tool, body.inputs);
    const calculation = addCalculation(viewer.orgId, job.id, viewer.userId, { ...body, ...run });
    return Response.json({ calculation }, { status: 201 });
  });
