import { randomUUID } from 'node:crypto';
import { and, asc, desc, eq } from 'drizzle-orm';
import { calculations } from '../../../db/schema';
import { getDb } from '../db/client';
import { touchJob } from './jobs';

export type CalculationRow = typeof calculations.$inferSelect;
export type Tool = CalculationRow['tool'];
export type UnitSystemId = CalculationRow['unitSystem'];

export interface NewCalculation {
  tool: Tool;
  label: string;
  inputs: unknown;
  /** Always the engine's own output, computed on the server. */
  results: unknown;
  unitSystem: UnitSystemId;
  engineVersion: string;
  revisionOf?: string | null;
  openPath?: string | null;
}

/** A job's calculations, newest first. The job must be this organisation's. */
export function listCalculations(orgId: string, jobId: string): CalculationRow[] {
  return getDb()
    .select()
    .from(calculations)
    .where(and(eq(calculations.organisationId, orgId), eq(calculations.jobId, jobId)))
    .orderBy(desc(calculations.createdAt), asc(calculations.id))
    .all();
}

/** One calculation of one job of this organisation, or null. */
export function getCalculation(orgId: string, jobId: string, calcId: string): CalculationRow | null {
  return (
    getDb()
      .select()
      .from(calculations)
      .where(
        and(
          eq(calculations.organisationId, orgId),
          eq(calculations.jobId, jobId),
          eq(calculations.id, calcId),
        ),
      )
      .get() ?? null
  );
}

/** Store a snapshot; the caller has checked that the job is this organisation's. */
export function addCalculation(
  orgId: string,
  jobId: string,
  userId: string | null,
  calc: NewCalculation,
): CalculationRow {
  const row = {
    id: `calc_${randomUUID()}`,
    jobId,
    organisationId: orgId,
    tool: calc.tool,
    label: calc.label,
    inputs: calc.inputs,
    results: calc.results,
    unitSystem: calc.unitSystem,
    engineVersion: calc.engineVersion,
    revisionOf: calc.revisionOf ?? null,
    openPath: calc.openPath ?? null,
    createdBy: userId,
    createdAt: new Date(),
  } satisfies CalculationRow;
  // The snapshot and the job's "changed" stamp are one write: both land or neither does.
  getDb().transaction((tx) => {
    tx.insert(calculations).values(row).run();
    touchJob(orgId, jobId, userId, tx);
  });
  return row;
}

/** Delete one calculation; false when it is not this organisation's job's. */
export function deleteCalculation(orgId: string, jobId: string, calcId: string, userId: string | null): boolean {
  return getDb().transaction((tx) => {
    const res = tx
      .delete(calculations)
      .where(
        and(
          eq(calculations.organisationId, orgId),
          eq(calculations.jobId, jobId),
          eq(calculations.id, calcId),
        ),
      )
      .run();
    if (res.changes) touchJob(orgId, jobId, userId, tx);
    return res.changes > 0;
  });
}

/** Every calculation of an organisation, by job then age (export). */
export function allCalculations(orgId: string): CalculationRow[] {
  return getDb()
    .select()
    .from(calculations)
    .where(eq(calculations.organisationId, orgId))
    .orderBy(asc(calculations.jobId), asc(calculations.createdAt), asc(calculations.id))
    .all();
}
