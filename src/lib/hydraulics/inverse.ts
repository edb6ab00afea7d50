/**
 * The contractor's inverse questions for a gravity line: how much head a target flow needs, how
 * many lines in parallel deliver it, and the smallest catalogue size that does.
 */
import type {
  FluidInput,
  FluidProps,
  LineInput,
  LineRequest,
  LineResult,
  LossBreakdown,
  Regime,
  Warning,
} from './types';
import { EngineInputError } from './types';
import { ENGINE_VERSION, G } from './constants';
import type { PipeSize, SizeFamily } from './catalog';
import { sizes } from './catalog';
import { resolveFluid } from './fluid';
import { frictionFactor } from './friction';
import type { ResolvedLine } from './line';
import { levelsOf, lineFlowAtHead, lossesAt, resolveLine, solveLine } from './line';
import { flowWarnings } from './warnings';

/** Most parallel lines API v1 accepts. */
export const MAX_PARALLEL_LINES = 50;

function targetFlow(v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v) || v <= 0) {
    throw new EngineInputError('flow_m3_s', 'must be a number > 0');
  }
  return v;
}

/**
 * Head a resolved line needs to carry a flow: H = (1 + K_e + ΣK + f·L/D)·V²/(2g), V = Q/(n·A),
 * f by {@link frictionFactor} at Re = V·D/ν (explicit: no iteration needed in this direction).
 * @param flowM3S flow of all parallel lines together, m³/s, > 0.
 * @returns head, m, with the flow state.
 */
export function headAtFlow(
  line: ResolvedLine,
  flowM3S: number,
  fluid: FluidProps,
): { headM: number; velocityMS: number; reynolds: number; f: number; regime: Regime } {
  const v = flowM3S / (line.parallel * line.areaM2);
  const re = (fluid.density_kg_m3 * v * line.diameterM) / fluid.viscosity_pa_s;
  const { f, regime } = frictionFactor(re, line.relativeRoughness);
  const headM = ((line.kMinorTotal + f * line.lengthOverD) * v * v) / (2 * G);
  return { headM, velocityMS: v, reynolds: re, f, regime };
}

export interface HeadForFlowRequest {
  fluid?: FluidInput;
  line: LineInput;
  /** Target flow of all parallel lines together, m³/s. */
  flow_m3_s: number;
}

export interface HeadForFlowResult {
  head_m: number;
  velocity_m_s: number;
  reynolds: number;
  friction_factor: number;
  regime: Regime;
  losses_m: LossBreakdown;
  warnings: Warning[];
  engine_version: string;
}

/** Head (source level above the outlet or tailwater) needed for a target flow. */
export function headForFlow(req: HeadForFlowRequest): HeadForFlowResult {
  const fluid = resolveFluid(req.fluid);
  const line = resolveLine(req.line);
  const s = headAtFlow(line, targetFlow(req.flow_m3_s), fluid);
  return {
    head_m: s.headM,
    velocity_m_s: s.velocityMS,
    reynolds: s.reynolds,
    friction_factor: s.f,
    regime: s.regime,
    losses_m: lossesAt(line, s.velocityMS, s.f),
    warnings: flowWarnings(s.regime, s.reynolds, line.relativeRoughness, s.velocityMS),
    engine_version: ENGINE_VERSION,
  };
}

export interface FlowTargetRequest extends LineRequest {
  flow_m3_s: number;
}

export interface LinesForFlowResult {
  /** Fewest identical lines that deliver the target, or null when more than 50 would be needed or there is no head. */
  parallel_lines: number | null;
  /** Flow of one line at this head, m³/s. */
  flow_per_line_m3_s: number;
  /** Flow of the recommended lines together, m³/s (0 when parallel_lines is null). */
  flow_m3_s: number;
  engine_version: string;
}

/** How many of this line, side by side, carry the target flow at the request's head. */
export function linesForFlow(req: FlowTargetRequest): LinesForFlowResult {
  const target = targetFlow(req.flow_m3_s);
  const fluid = resolveFluid(req.fluid);
  const line = { ...resolveLine(req.line), parallel: 1 };
  const q1 = lineFlowAtHead(line, levelsOf(req), fluid).flowM3S;
  // A hair of slack so that an exact multiple does not round up to one line more.
  const n = q1 > 0 ? Math.max(1, Math.ceil(target / q1 - 1e-12)) : Infinity;
  const ok = n <= MAX_PARALLEL_LINES;
  return {
    parallel_lines: ok ? n : null,
    flow_per_line_m3_s: q1,
    flow_m3_s: ok ? n * q1 : 0,
    engine_version: ENGINE_VERSION,
  };
}

export interface SizeForFlowRequest extends Omit<LineRequest, 'line'> {
  /** The line without a diameter; without roughness or material each size's own material is used. */
  line: Omit<LineInput, 'inner_diameter_m'>;
  flow_m3_s: number;
  /** Only sizes of these families (all when absent). */
  families?: SizeFamily[];
}

export interface SizeForFlowResult {
  /** Smallest catalogue size that delivers the target, or null when none does. */
  size: PipeSize | null;
  /** The gravity-line result with that size, or null. */
  result: LineResult | null;
}

/**
 * Smallest inside diameter in the catalogue (optionally within some families) that delivers
 * the target flow at the request's head.
 */
export function smallestSizeForFlow(req: SizeForFlowRequest): SizeForFlowResult {
  const target = targetFlow(req.flow_m3_s);
  const pool = sizes
    .filter((s) => !req.families || req.families.includes(s.family))
    .sort((a, b) => a.inner_diameter_m - b.inner_diameter_m);
  const own = req.line.roughness_m !== undefined || req.line.material !== undefined;
  for (const size of pool) {
    if (req.line.roughness_m !== undefined && req.line.roughness_m >= size.inner_diameter_m)
      continue;
    const line: LineInput = {
      ...req.line,
      inner_diameter_m: size.inner_diameter_m,
      ...(own ? {} : { material: size.material }),
    };
    const result = solveLine({ ...req, line });
    if (result.flow_m3_s >= target) return { size, result };
  }
  return { size: null, result: null };
}
