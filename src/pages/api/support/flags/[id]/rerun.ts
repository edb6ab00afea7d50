import type { APIRoute } from 'astro';
import { getDb } from '../../../../../lib/db/client';
import { recordAudit } from '../../../../../lib/flags/audit';
import { getFlagDetail } from '../../../../../lib/flags/detail';
import { forbidden, staffOf } from '../../../../../lib/flags/http';
import { rerunSnapshot } from '../../../../../lib/flags/rerun';

/** Solve the frozen inputs on today's engine and compare with the frozen results. */
export const GET: APIRoute = ({ params, locals }) => {
  const actor = staffOf(locals);
  if (!actor) return forbidden();
  const db = getDb();
  const flag = getFlagDetail(db, params.id ?? '');
  if (!flag) return Response.json({ error: 'not_found' }, { status: 404 });
  const { inputs, results } = flag.snapshot;
  const rerun = rerunSnapshot(flag.tool, inputs, results);
  recordAudit(db, actor, 'flag.rerun', flag.id, {
    engineVersion: rerun.engineVersion,
    changed: rerun.ok ? rerun.changed : null,
  });
  return Response.json(rerun, { headers: { 'Cache-Control': 'no-store' } });
};
