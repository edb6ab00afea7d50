import Papa from 'papaparse';
import { allCalculations } from '../data/calculations';
import type { CalculationRow } from '../data/calculations';
import { allJobs } from '../data/jobs';
import type { JobRow } from '../data/jobs';

export interface JobExport extends JobRow {
  calculations: CalculationRow[];
}

/** Every job of an organisation with its calculations (the JSON export). */
export function exportJobs(orgId: string): JobExport[] {
  const calcs = allCalculations(orgId);
  return allJobs(orgId).map((job) => ({ ...job, calculations: calcs.filter((c) => c.jobId === job.id) }));
}

function iso(d: Date | null): string {
  return d ? d.toISOString() : '';
}

function num(results: unknown, key: string): number | '' {
  const v = (results as Record<string, unknown> | null)?.[key];
  return typeof v === 'number' ? v : '';
}

function csvRow(job: JobRow, c: CalculationRow | null): Record<string, string | number> {
  return {
    job_id: job.id,
    job_title: job.title,
    client: job.client,
    site_address: job.siteAddress,
    status: job.status,
    notes: job.notes,
    job_created_at: iso(job.createdAt),
    job_updated_at: iso(job.updatedAt),
    calculation_id: c?.id ?? '',
    tool: c?.tool ?? '',
    label: c?.label ?? '',
    unit_system: c?.unitSystem ?? '',
    engine_version: c?.engineVersion ?? '',
    calculation_created_at: iso(c?.createdAt ?? null),
    revision_of: c?.revisionOf ?? '',
    result_status: String((c?.results as { status?: string } | undefined)?.status ?? ''),
    flow_m3_s: c ? num(c.results, 'flow_m3_s') || num(c.results, 'initial_flow_m3_s') : '',
    head_m: c ? num(c.results, 'head_m') : '',
    time_s: c ? num(c.results, 'time_s') : '',
    inputs_json: c ? JSON.stringify(c.inputs) : '',
    results_json: c ? JSON.stringify(c.results) : '',
  };
}

/**
 * One CSV row per calculation (a job without any gets one row), SI units as in the API. Cells
 * that a spreadsheet would run as a formula are escaped.
 */
export function exportCsv(orgId: string): string {
  const rows = exportJobs(orgId).flatMap((job) =>
    job.calculations.length ? job.calculations.map((c) => csvRow(job, c)) : [csvRow(job, null)],
  );
  const fields = Object.keys(csvRow({} as JobRow, null));
  return Papa.unparse({ fields, data: rows.map((r) => fields.map((f) => r[f])) }, { escapeFormulae: true });
}
