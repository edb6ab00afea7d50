import { z } from 'zod';
import { unitSystems } from '../hydraulics/units';
import { FLAG_REASONS, FLAG_STATUSES, FLAG_TOOLS } from '../../../db/schema/flags';

/** Largest snapshot part we keep, in characters of JSON (a drain curve of 2000 points fits). */
const MAX_JSON_CHARS = 400_000;

const jsonObject = z
  .record(z.string(), z.unknown())
  .refine((v) => JSON.stringify(v).length <= MAX_JSON_CHARS, 'is too large to keep');

/** Body of POST /api/flags. */
export const newFlagSchema = z.object({
  tool: z.enum(FLAG_TOOLS),
  reason: z.enum(FLAG_REASONS),
  message: z.string().trim().max(4000).default(''),
  /** Required when signed out; ignored when signed in (the account's address is used). */
  email: z.email().max(254).optional(),
  snapshot: z.object({
    inputs: jsonObject,
    results: jsonObject,
    engineVersion: z.string().trim().min(1).max(40),
    unitSystem: z.enum(unitSystems),
    page: z
      .string()
      .max(300)
      .regex(/^\/[^\s]*$/, 'must be a path on this site, starting with /'),
  }),
});
export type NewFlag = z.infer<typeof newFlagSchema>;

/** Query of GET /api/support/flags. */
export const queueQuerySchema = z.object({
  status: z.enum([...FLAG_STATUSES, 'open', 'all']).default('open'),
  tool: z.enum([...FLAG_TOOLS, 'all']).default('all'),
  sort: z.enum(['oldest', 'newest']).default('oldest'),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  perPage: z.coerce.number().int().min(1).max(100).default(20),
});
export type QueueQuery = z.infer<typeof queueQuerySchema>;

/** Body of PATCH /api/support/flags/[id]: a status change, an assignment, or both. */
export const flagUpdateSchema = z
  .object({
    status: z.enum(FLAG_STATUSES).optional(),
    /** A staff user's id, or null to unassign. */
    assigneeUserId: z.string().min(1).max(100).nullable().optional(),
  })
  .refine((v) => v.status !== undefined || v.assigneeUserId !== undefined, 'nothing to change');
export type FlagUpdate = z.infer<typeof flagUpdateSchema>;

/** Body of a note or a reply. */
export const messageSchema = z.object({ body: z.string().trim().min(1).max(8000) });

/** Query of GET /api/support/audit. */
export const auditQuerySchema = z.object({
  flagId: z.string().min(1).max(100).optional(),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  perPage: z.coerce.number().int().min(1).max(200).default(50),
});

/** One line per problem, "path: message", for a 400 body. */
export function issuesOf(error: z.ZodError): { path: string; message: string }[] {
  return error.issues.map((i) => ({ path: i.path.join('.') || '(body)', message: i.message }));
}
