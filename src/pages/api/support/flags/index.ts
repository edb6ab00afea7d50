import type { APIRoute } from 'astro';
import { getDb } from '../../../../lib/db/client';
import { recordAudit } from '../../../../lib/flags/audit';
import { forbidden, invalid, staffOf } from '../../../../lib/flags/http';
import { listQueue } from '../../../../lib/flags/queue';
import { queueQuerySchema } from '../../../../lib/flags/schemas';

/** The support queue: flags filtered by status and tool, sorted by age, a page at a time. */
export const GET: APIRoute = ({ url, locals }) => {
  const actor = staffOf(locals);
  if (!actor) return forbidden();
  const parsed = queueQuerySchema.safeParse(Object.fromEntries(url.searchParams));
  if (!parsed.success) return invalid(parsed.error);
  const db = getDb();
  const page = listQueue(db, parsed.data);
  recordAudit(db, actor, 'queue.view', null, {
    ...parsed.data,
    shown: page.flags.map((f) => f.id),
  });
  return Response.json(page, { headers: { 'Cache-Control': 'no-store' } });
};
