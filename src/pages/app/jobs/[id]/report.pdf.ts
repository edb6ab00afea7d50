import type { APIRoute } from 'astro';
import { handle, notFound } from '../../../../lib/jobs/http';
import { jobsViewer } from '../../../../lib/jobs/viewer';
import { loadReport, paperOf, pdfName } from '../../../../lib/report/load';
import { reportPdf } from '../../../../lib/report/pdf';

/** The job's report as a PDF made on the server; reading it is allowed when read-only. */
export const GET: APIRoute = ({ locals, params, url }) =>
  handle(async () => {
    const viewer = jobsViewer(locals, 'export');
    const model = loadReport(viewer.orgId, params.id ?? '');
    if (!model) throw notFound();
    const pdf = await reportPdf(model, paperOf(url));
    return new Response(new Uint8Array(pdf), {
      headers: {
        'Content-Type': 'application/pdf',
        'Content-Disposition': `attachment; filename="${pdfName(model)}"`,
        'X-Content-Type-Options': 'nosniff',
        'Cache-Control': 'no-store',
      },
    });
  });
