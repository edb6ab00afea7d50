import type { APIRoute } from 'astro';
import { z } from 'zod';
import { EmailError, sendEmail } from '../../../../../lib/email/send';
import { handle, HttpError, jsonBody, notFound, parseWith } from '../../../../../lib/jobs/http';
import { jobsWriter } from '../../../../../lib/jobs/viewer';
import { reportEmail } from '../../../../../lib/report/email';
import { loadReport, pdfName } from '../../../../../lib/report/load';
import { reportPdf } from '../../../../../lib/report/pdf';

const body = z.strictObject({
  to: z.email('must be an e-mail address').max(254),
  message: z.string().trim().max(2000).default(''),
  paper: z.enum(['a4', 'letter']).default('a4'),
});

/** E-mail the job's report to the client with the PDF attached. */
export const POST: APIRoute = ({ locals, params, request }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    const { to, message, paper } = parseWith(body, await jsonBody(request));
    const model = loadReport(viewer.orgId, params.id ?? '');
    if (!model) throw notFound();
    const pdf = await reportPdf(model, paper === 'letter' ? 'LETTER' : 'A4');
    const mail = reportEmail(model, message, locals.user?.email);
    try {
      const id = await sendEmail({ ...mail, to, attachments: [{ filename: pdfName(model), content: pdf, contentType: 'application/pdf' }] });
      return Response.json({ sent: true, id }, { status: 202 });
    } catch (e) {
      if (e instanceof EmailError) throw new HttpError(502, { error: 'email_failed', message: e.message });
      throw e;
    }
  });
