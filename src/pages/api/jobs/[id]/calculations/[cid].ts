import type { APIRoute } from 'astro';
import { deleteCalculation, getCalculation } from '../../../../../lib/data/calculations';
import { handle, HttpError, notFound } from '../../../../../lib/jobs/http';
import { diffResults } from '../../../../../lib/jobs/rerun-diff';
import { runCalculation } from '../../../../../lib/jobs/run-calculation';
import { jobsViewer, jobsWriter } from '../../../../../lib/jobs/viewer';

/**
 * One calculation. With ?rerun=1 it is also run on today's engine (nothing is stored) and the
 * answer lists every result that changed.
 */
export const GET: APIRoute = ({ locals, params, url }) =>
  handle(() => {
    const viewer = jobsViewer(locals);
    const calc = getCalculation(viewer.orgId, params.id ?? '', params.cid ?? '');
    if (!calc) throw notFound('calculation');
    if (url.searchParams.get('rerun') !== '1') return Response.json({ calculation: calc });
    let run;
    try {
      run = runCalculation(calc.tool, calc.inputs);
    } catch (e) {
      if (!(e instanceof HttpError)) throw e;
      return Response.json({ calculation: calc, rerun: { error: e.body } });
    }
    const changes = diffResults(calc.results, run.results);
    return Response.json({ calculation: calc, rerun: { ...run, changes } });
  });

export const DELETE: APIRoute = ({ locals, params }) =>
  handle(() => {
    const viewer = jobsWriter(locals);
    if (!deleteCalculation(viewer.orgId, params.id ?? '', params.cid ?? '', viewer.userId)) {
      throw notFound('calculation');
    }
    return new Response(null, { status: 204 });
  });
