import type { APIRoute } from 'astro';
import { getDb } from '../../../../../lib/db/client';
import { recordAudit } from '../../../../../lib/flags/audit';
import { getFlagDetail } from '../../../../../lib/flags/detail';
import { actionError, forbidden, invalid, jsonBody, staffOf } from '../../../../../lib/flags/http';
import { flagUpdateSchema } from '../../../../../lib/flags/schemas';
import { updateFlag } from '../../../../../lib/flags/thread';

const notFound = (): Response => Response.json({ error: 'not_found' }, { status: 404 });

/** One flag with its snapshot and whole thread. */
export const GET: APIRoute = ({ params, locals }) => {
  const actor = staffOf(locals);
  if (!actor) return forbidden();
  const db = getDb();
  const flag = getFlagDetail(db, params.id ?? '');
  if (!flag) return notFound();
  recordAudit(db, actor, 'flag.view', flag.id, { via: 'api' });
  return Response.json(flag, { headers: { 'Cache-Control': 'no-store' } });
};

/** Change a flag's status or assignee. */
export const PATCH: APIRoute = async ({ params, request, locals }) => {
  const actor = staffOf(locals);
  if (!actor) return forbidden();
  const parsed = flagUpdateSchema.safeParse(await jsonBody(request));
  if (!parsed.success) return invalid(parsed.error);
  const db = getDb();
  try {
    updateFlag(db, actor, params.id ?? '', parsed.data);
  } catch (err) {
    return actionError(err);
  }
  const flag = getFlagDetail(db, params.id ?? '');
  return Response.json({ status: flag?.status, assigneeUserId: flag?.assigneeUserId ?? null });
};
