import type { APIRoute } from 'astro';
import { getDb } from '../../../lib/db/client';
import { listAudit, recordAudit } from '../../../lib/flags/audit';
import { forbidden, invalid, staffOf } from '../../../lib/flags/http';
import { auditQuerySchema } from '../../../lib/flags/schemas';

/** The audit log, newest first (admins only). */
export const GET: APIRoute = ({ url, locals }) => {
  const actor = staffOf(locals);
  if (!actor || actor.staffRole !== 'admin') return forbidden();
  const parsed = auditQuerySchema.safeParse(Object.fromEntries(url.searchParams));
  if (!parsed.success) return invalid(parsed.error);
  const db = getDb();
  const log = listAudit(db, parsed.data);
  recordAudit(db, actor, 'audit.view', null, { via: 'api', ...parsed.data });
  return Response.json(log, { headers: { 'Cache-Control': 'no-store' } });
};
