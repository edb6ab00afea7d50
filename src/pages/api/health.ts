import type { APIRoute } from 'astro';
import { getDb } from '../../lib/db/client';
import { healthReport } from '../../lib/health';

/** 200 when every required check passes (status ok or degraded), else 503. */
export const GET: APIRoute = async () => {
  const health = await healthReport(getDb);
  return Response.json(health, {
    status: health.status === 'unavailable' ? 503 : 200,
    headers: { 'Cache-Control': 'no-store' },
  });
};
