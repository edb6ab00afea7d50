import type { APIRoute } from 'astro';
import { findLiveShare } from '../../../lib/data/report-shares';
import { loadReport, paperOf, pdfName } from '../../../lib/report/load';
import { reportPdf } from '../../../lib/report/pdf';

/** The shared report as a PDF, while the link is live. */
export const GET: APIRoute = async ({ params, url }) => {
  const share = findLiveShare(params.token ?? '');
  const model = share ? loadReport(share.organisationId, share.jobId) : null;
  if (!model) return new Response('This report link has expired or was withdrawn.', { status: 404 });
  const pdf = await reportPdf(model, paperOf(url));
  return new Response(new Uint8Array(pdf), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': `attachment; filename="${pdfName(model)}"`,
      'Cache-Control': 'no-store',
      'Referrer-Policy': 'no-referrer',
    },
  });
};
