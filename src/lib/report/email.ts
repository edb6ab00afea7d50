import { esc } from '../email/escape';
import type { ReportModel } from './model';

/** Subject and body of the e-mail that carries a report PDF to the client. */
export function reportEmail(m: ReportModel, note: string, replyTo?: string): { subject: string; html: string; text: string; replyTo?: string } {
  const company = m.brand.companyName || 'Your contractor';
  const lines = [
    `${company} has sent you the report for "${m.job.title}" (${m.job.siteAddress || m.job.client}).`,
    ...(note ? ['', note] : []),
    '',
    'The report is attached as a PDF. Its figures are estimates; local codes and licensed practice govern.',
  ];
  return {
    subject: `Report: ${m.job.title} — ${company}`,
    text: lines.join('\n'),
    html: lines.map((l) => (l ? `<p>${esc(l)}</p>` : '')).join(''),
    ...(replyTo ? { replyTo } : {}),
  };
}
