import { z } from 'zod';
import { unitSystems } from '../hydraulics/units';
import { JOB_STATUSES } from '../../../db/schema';
import { JOB_SORTS } from '../data/jobs';

const text = (max: number): z.ZodString => z.string().trim().max(max, `must be at most ${max} characters`);

export const jobFieldsSchema = z.strictObject({
  title: text(200).min(1, 'is required'),
  client: text(200).default(''),
  siteAddress: text(500).default(''),
  notes: text(20_000).default(''),
  status: z.enum(JOB_STATUSES).default('scoping'),
});

const jobFieldsPatch = z
  .strictObject({
    title: text(200).min(1, 'cannot be empty'),
    client: text(200),
    siteAddress: text(500),
    notes: text(20_000),
    status: z.enum(JOB_STATUSES),
  })
  .partial();

/** An edit names the revision it was loaded at, so a stale one is refused (409), not applied. */
export const jobPatchSchema = jobFieldsPatch
  .extend({
    revision: z
      .number({ error: 'is required: the revision the job was loaded at' })
      .int('must be a whole number')
      .min(1, 'must be at least 1'),
  })
  .refine((p) => Object.keys(p).length > 1, { message: 'change at least one field' });

const intParam = (min: number, max: number): z.ZodType<number> =>
  z.coerce.number().int('must be a whole number').min(min).max(max);

export const jobListQuerySchema = z.strictObject({
  q: z.string().max(200).optional(),
  status: z.enum(JOB_STATUSES).optional(),
  sort: z.enum(JOB_SORTS).optional(),
  dir: z.enum(['asc', 'desc']).optional(),
  page: intParam(1, 100_000).optional(),
  pageSize: intParam(1, 100).optional(),
});

export const TOOLS = ['line', 'siphon', 'drain'] as const;

/** Calculator pages a saved calculation may link back to. */
const OPEN_PATH = /^\/(check|siphon|gravity-line|drain)(\?[^\s#]*)?$/;

export const calculationCreateSchema = z.strictObject({
  tool: z.enum(TOOLS),
  label: text(200).default(''),
  /** The engine request; validated by running the engine on it. */
  inputs: z.record(z.string(), z.unknown()),
  unitSystem: z.enum(unitSystems),
  revisionOf: z.string().max(100).optional(),
  openPath: z.string().max(4000).regex(OPEN_PATH, 'must be a calculator link').optional(),
});

export type CalculationCreate = z.infer<typeof calculationCreateSchema>;

/** Query params as a plain object, dropping empty values so "?status=" means no filter. */
export function queryObject(url: URL): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of url.searchParams) if (v !== '') out[k] = v;
  return out;
}
