import type { APIRoute } from 'astro';
import { z } from 'zod';
import { EmailError, sendEmail } from '../../../../../lib/email/send';
import { handle, HttpError, jsonBody, notFound, parseWith } from '../../../../../lib/jobs/http';
import { jobsWriter } from '../../../../../lib/jobs/viewer';
import { reportEmail } from '../../../../../lib/report/email';
import { loadReport, pdfName } from '../../../../../lib/report/load';
import { reportPdf } from '../../../../../lib/report/pdf';
import { sendOnce } from '../../../../../lib/report/send-once';

const body = z.strictObject({
  to: z.email('must be an e-mail address').max(254),
  message: z.string().trim().max(2000).default(''),
  paper: z.enum(['a4', 'letter']).default('a4'),
  /** One per rendering of the send form, so a double click sends one message. */
  idempotencyKey: z.string().regex(/^[\w-]{8,100}$/, 'must be 8 to 100 letters, digits, - or _').optional(),
});

/** E-mail the job's report to the client with the PDF attached. */
export const POST: APIRoute = ({ locals, params, request }) =>
  handle(async () => {
    const viewer = jobsWriter(locals);
    const { to, message, paper, idempotencyKey } = parseWith(body, await jsonBody(request));
    const model = loadReport(viewer.orgId, params.id ?? '');
    if (!model) throw notFound();
    const send = async (): Promise<string> => {
      const pdf = await reportPdf(model, paper === 'letter' ? 'LETTER' : 'A4');
      const mail = reportEmail(model, message, locals.user?.email);
      return sendEmail({ ...mail, to, attachments: [{ filename: pdfName(model), content: pdf, contentType: 'application/pdf' }] });
    };
    try {
      const { id, repeated } = await sendOnce(`${viewer.orgId}/${params.id}`, idempotencyKey, send);
      return Response.json({ sent: true, id, repeated }, { status: 202 });
    } catch (e) {
      if (e instanceof EmailError) throw new HttpError(502, { error: 'email_failed', message: e.message });
      throw e;
    }
  });
