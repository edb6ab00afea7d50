/**
 * Smallest catalogue hose or pipe size whose line (or siphon) empties a vessel to its final
 * depth within a target time. Every size is tried in order of bore, because a larger siphon
 * line can break sooner (more velocity head at the crest), so "bigger is faster" cannot be
 * assumed and a bisection over sizes could skip the answer.
 */
import type { PipeSize, SizeFamily } from './catalog';
import { sizes } from './catalog';
import { solveDrain } from './drain';
import type { DrainRequest, DrainResult, LineInput, LineOutlet, SiphonOutlet } from './types';
import { EngineInputError } from './types';

/** A line without its diameter: each catalogue size supplies its own. */
export type SizelessLine = Omit<LineInput, 'inner_diameter_m'>;

export type SizelessOutlet =
  | (Omit<LineOutlet, 'line'> & { line: SizelessLine })
  | (Omit<SiphonOutlet, 'line'> & { line: SizelessLine });

export interface SizeForDrainRequest extends Omit<DrainRequest, 'outlet'> {
  /** A gravity line or siphon outlet whose line has no diameter; without roughness or material
   * each size's own catalogue material is used. */
  outlet: SizelessOutlet;
  /** The time the job may take, s, > 0. */
  target_time_s: number;
  /** Only sizes of these families (all when absent). */
  families?: SizeFamily[];
}

export interface SizeForDrainResult {
  /** Smallest size that reaches the final depth within the target time, or null when none does. */
  size: PipeSize | null;
  /** The drain-down with that size, or null. */
  result: DrainResult | null;
}

function outletWithSize(o: SizelessOutlet, size: PipeSize): LineOutlet | SiphonOutlet {
  const own = o.line.roughness_m !== undefined || o.line.material !== undefined;
  const line: LineInput = {
    ...o.line,
    inner_diameter_m: size.inner_diameter_m,
    ...(own ? {} : { material: size.material }),
  };
  return { ...o, line } as LineOutlet | SiphonOutlet;
}

/**
 * Smallest catalogue size (optionally within some families) whose drain-down ends with status
 * `drains` (the final depth reached) in no more than `target_time_s`.
 * @throws EngineInputError for a bad target, outlet type or any drain input.
 */
export function smallestSizeForDrain(req: SizeForDrainRequest): SizeForDrainResult {
  const target = req.target_time_s;
  if (typeof target !== 'number' || !Number.isFinite(target) || target <= 0) {
    throw new EngineInputError('target_time_s', 'must be a number of seconds > 0');
  }
  const o = req.outlet;
  if (!o || (o.type !== 'line' && o.type !== 'siphon')) {
    throw new EngineInputError('outlet.type', 'must be line or siphon to size a line');
  }
  const { target_time_s: _t, families, ...drain } = req;
  const pool = sizes
    .filter((s) => !families || families.includes(s.family))
    .sort((a, b) => a.inner_diameter_m - b.inner_diameter_m);
  for (const size of pool) {
    if (o.line.roughness_m !== undefined && o.line.roughness_m >= size.inner_diameter_m) continue;
    const result = solveDrain({ ...drain, outlet: outletWithSize(o, size) });
    if (result.status === 'drains' && result.time_s <= target) return { size, result };
    // An uncovered intake or a lost head depends on levels only, never on the bore.
    if (result.stop_reason === 'intake_uncovered' || result.stop_reason === 'no_head') break;
  }
  return { size: null, result: null };
}
