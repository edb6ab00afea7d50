import type { APIRoute } from 'astro';
import { getDb } from '../../lib/db/client';
import { checkHealth } from '../../lib/health';

export const GET: APIRoute = () => {
  const health = checkHealth(getDb);
  return Response.json(health, {
    status: health.status === 'ok' ? 200 : 503,
    headers: { 'Cache-Control': 'no-store' },
  });
};
