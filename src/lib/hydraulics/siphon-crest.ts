/**
 * A siphon's crest: the practical pressure limit, the crest pressure for a source level and
 * flow, the highest crest the flow allows, and the source level at which the siphon breaks.
 * Energy equation from the source surface (at rest, atmospheric) to the crest:
 *   p_crest = p_atm − ρg(z_crest − z_source) − ρV²/2·(1 + K_entrance + K_to_crest + f·L_to_crest/D).
 */
import type { FluidProps } from './types';
import { EngineInputError } from './types';
import { G } from './constants';
import type { LineState, ResolvedLine } from './line-resolve';
import { lineFlowAtHead } from './line';
import { brentRoot } from './roots';

/**
 * Share of the theoretical lift (p_atm − p_v)/(ρg) held back as a margin when no
 * min_crest_pressure_pa is given. Common practice: cold water at sea level could in theory be
 * lifted about 10.3 m, yet crews plan on roughly 7.5–8.5 m because air dissolved in the water
 * comes out of solution well above the vapour pressure, gathers at the crest and breaks the
 * siphon. Keeping 20 % of the available pressure in reserve gives about 8.1 m of static lift for
 * water at 15 °C at sea level and scales sensibly with altitude and warm water.
 */
export const DEFAULT_CREST_MARGIN_FRACTION = 0.2;

/**
 * Practical lowest crest pressure: p_limit = p_v + 0.2·(p_atm − p_v) (common practice, see
 * {@link DEFAULT_CREST_MARGIN_FRACTION}).
 * @param atmosphericPa absolute atmospheric pressure at the site, Pa.
 * @param vaporPa vapour pressure of the liquid, Pa.
 * @returns absolute pressure, Pa.
 */
export function defaultCrestLimit(atmosphericPa: number, vaporPa: number): number {
  return vaporPa + DEFAULT_CREST_MARGIN_FRACTION * Math.max(0, atmosphericPa - vaporPa);
}

/**
 * Lowest crest pressure at which the siphon still counts as running full: the limit, but never
 * below the vapour pressure, where the liquid boils at the crest and the siphon breaks whatever
 * limit the caller accepted.
 * @returns absolute pressure, Pa.
 */
export function workingCrestPressure(limitPa: number, vaporPa: number): number {
  return Math.max(limitPa, vaporPa);
}

/**
 * Verdict of a flowing siphon from its crest pressure: `breaks` below the vapour pressure,
 * `marginal` from the vapour pressure up to the limit, `runs` at or above both.
 */
export function crestStatus(
  crest: Pick<ResolvedCrest, 'limitPa' | 'vaporPa'>,
  crestPa: number,
): 'runs' | 'marginal' | 'breaks' {
  if (!(crestPa >= crest.vaporPa)) return 'breaks';
  return crestPa >= crest.limitPa ? 'runs' : 'marginal';
}

/** The crest part of a siphon input (same field names in SiphonRequest and a drain SiphonOutlet). */
export interface CrestInput {
  crest_elevation_m: number;
  length_to_crest_m: number;
  minor_loss_k_to_crest?: number;
  min_crest_pressure_pa?: number;
}

/** Crest geometry and pressures with defaults applied (SI). */
export interface ResolvedCrest {
  elevationM: number;
  lengthToCrestM: number;
  /** 1 + K_entrance + K_to_crest: the V²/2g multiplier up to the crest apart from friction. */
  kToCrestTotal: number;
  /** L_to_crest / D. */
  lengthToCrestOverD: number;
  limitPa: number;
  atmosphericPa: number;
  vaporPa: number;
  densityKgM3: number;
}

function finite(v: unknown, path: string, ok: (x: number) => boolean, rule: string): number {
  if (typeof v !== 'number' || !Number.isFinite(v) || !ok(v))
    throw new EngineInputError(path, `must be ${rule}`);
  return v;
}

/**
 * Validate and resolve a siphon's crest.
 * @param path prefix of the crest fields in the request ('' for /siphon, 'outlet' in /drain).
 */
export function resolveCrest(
  line: ResolvedLine,
  input: CrestInput,
  fluid: FluidProps,
  atmosphericPa: number,
  path = '',
): ResolvedCrest {
  const p = (k: string): string => (path ? `${path}.${k}` : k);
  const z = finite(input.crest_elevation_m, p('crest_elevation_m'), () => true, 'a number');
  const lc = finite(
    input.length_to_crest_m,
    p('length_to_crest_m'),
    (x) => x >= 0 && x <= line.lengthM,
    '≥ 0 and ≤ line.length_m',
  );
  const kc =
    input.minor_loss_k_to_crest === undefined
      ? 0
      : finite(
          input.minor_loss_k_to_crest,
          p('minor_loss_k_to_crest'),
          (x) => x >= 0 && x <= line.fittingsK * (1 + 1e-12),
          "≥ 0 and ≤ the line's total fittings K",
        );
  const limit =
    input.min_crest_pressure_pa === undefined
      ? defaultCrestLimit(atmosphericPa, fluid.vapor_pressure_pa)
      : finite(input.min_crest_pressure_pa, p('min_crest_pressure_pa'), (x) => x >= 0, '≥ 0 Pa');
  return {
    elevationM: z,
    lengthToCrestM: lc,
    kToCrestTotal: 1 + line.entranceK + kc,
    lengthToCrestOverD: lc / line.diameterM,
    limitPa: limit,
    atmosphericPa,
    vaporPa: fluid.vapor_pressure_pa,
    densityKgM3: fluid.density_kg_m3,
  };
}

/**
 * Absolute crest pressure for a source level and the line's flow state:
 * p = p_atm − ρg(z_crest − z_source) − ρV²/2·(1 + K_entrance + K_to_crest + f·L_to_crest/D), Pa.
 * @param sourceLevelM elevation of the source's free surface, m.
 * @param state velocity (m/s) and friction factor of one line at that level.
 */
export function crestPressureAt(
  crest: ResolvedCrest,
  sourceLevelM: number,
  state: LineState,
): number {
  const v = state.velocityMS;
  const loss = crest.kToCrestTotal + state.frictionFactor * crest.lengthToCrestOverD;
  return (
    crest.atmosphericPa -
    crest.densityKgM3 * G * (crest.elevationM - sourceLevelM) -
    0.5 * crest.densityKgM3 * v * v * loss
  );
}

/**
 * Crest height above the source surface at which, at this flow, the crest pressure would equal
 * the vapour pressure: (p_atm − p_v − ρV²/2·(1 + K_e + K_c + f·L_c/D)) / (ρg), m.
 */
export function maxCrestHeightAt(crest: ResolvedCrest, state: LineState): number {
  const v = state.velocityMS;
  const loss = crest.kToCrestTotal + state.frictionFactor * crest.lengthToCrestOverD;
  const rho = crest.densityKgM3;
  return (crest.atmosphericPa - crest.vaporPa - 0.5 * rho * v * v * loss) / (rho * G);
}

/**
 * Source level, between sinkLevelM (where the head is zero) and topLevelM, at which the crest
 * pressure falls to the crest's working pressure ({@link workingCrestPressure}: the limit, or
 * the vapour pressure when the limit is below it) as the source falls. Crest pressure rises with the source
 * level, so Brent's method on the bracket finds the single crossing (to 1e-9 m).
 * @returns topLevelM when already at or below the limit there; null when the limit is not
 *   reached before the head runs out.
 */
export function siphonBreakLevel(
  line: ResolvedLine,
  crest: ResolvedCrest,
  fluid: FluidProps,
  sinkLevelM: number,
  topLevelM: number,
): number | null {
  if (!(topLevelM > sinkLevelM)) return null;
  const st: LineState = {
    velocityMS: 0,
    flowM3S: 0,
    reynolds: 0,
    frictionFactor: 0,
    regime: 'laminar',
  };
  const floor = workingCrestPressure(crest.limitPa, crest.vaporPa);
  const margin = (z: number): number =>
    crestPressureAt(crest, z, lineFlowAtHead(line, z - sinkLevelM, fluid, st)) - floor;
  if (margin(topLevelM) <= 0) return topLevelM;
  if (margin(sinkLevelM) >= 0) return null;
  const z = brentRoot(margin, sinkLevelM, topLevelM, 1e-9);
  return Number.isNaN(z) ? null : z;
}
