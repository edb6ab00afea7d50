import type { APIRoute } from 'astro';
import { z } from 'zod';
import { exportCsv, exportJobs } from '../../../lib/jobs/export';
import { handle, parseWith } from '../../../lib/jobs/http';
import { queryObject } from '../../../lib/jobs/schemas';
import { jobsViewer } from '../../../lib/jobs/viewer';

const query = z.strictObject({ format: z.enum(['csv', 'json']).default('json') });

/** All jobs and calculations as CSV or JSON: always allowed, read-only accounts included. */
export const GET: APIRoute = ({ locals, url }) =>
  handle(() => {
    const viewer = jobsViewer(locals, 'export');
    const { format } = parseWith(query, queryObject(url));
    const day = new Date().toISOString().slice(0, 10);
    const headers = {
      'Content-Disposition': `attachment; filename="drainwright-jobs-${day}.${format}"`,
      'Cache-Control': 'no-store',
    };
    if (format === 'csv') {
      return new Response(`\ufeff${exportCsv(viewer.orgId)}`, {
        headers: { ...headers, 'Content-Type': 'text/csv; charset=utf-8' },
      });
    }
    const body = { exportedAt: new Date().toISOString(), organisationId: viewer.orgId, jobs: exportJobs(viewer.orgId) };
    return new Response(JSON.stringify(body, null, 2), {
      headers: { ...headers, 'Content-Type': 'application/json; charset=utf-8' },
    });
  });
