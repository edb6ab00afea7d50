import { getBrand } from '../data/brands';
import { listCalculations } from '../data/calculations';
import { getJob } from '../data/jobs';
import { getOrganisation } from '../data/organisations';
import { buildReport } from './model';
import type { ReportModel } from './model';

/** The report of one of this organisation's jobs, oldest calculation first; null if not theirs. */
export function loadReport(orgId: string, jobId: string): ReportModel | null {
  const job = getJob(orgId, jobId);
  if (!job) return null;
  const brand = getBrand(orgId, getOrganisation(orgId)?.name ?? '');
  return buildReport(brand, job, listCalculations(orgId, jobId).reverse());
}

/** "?paper=letter" picks US Letter; anything else is A4. */
export function paperOf(url: URL): 'A4' | 'LETTER' {
  return url.searchParams.get('paper') === 'letter' ? 'LETTER' : 'A4';
}

export function pdfName(m: ReportModel): string {
  const slug = m.job.title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'job';
  return `drainwright-report-${slug}.pdf`;
}
