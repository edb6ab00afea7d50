/**
 * Siphon: a gravity line whose crest rises above the source surface. Flow by the energy equation
 * of the whole line ({@link lineFlowAtHead}); the crest's absolute pressure by the energy
 * equation from the source surface to the crest:
 *   p_crest = p_atm − ρg(z_crest − z_source) − ρV²/2·(1 + K_entrance + K_to_crest + f·L_to_crest/D).
 */
import type { SiphonRequest, SiphonResult, Warning } from './types';
import { ENGINE_VERSION } from './constants';
import { resolveAtmosphere, resolveFluid } from './fluid';
import { levelsOf, lineFlowAtHead, lossesAt, resolveLine } from './line';
import {
  crestPressureAt,
  crestStatus,
  maxCrestHeightAt,
  resolveCrest,
  siphonBreakLevel,
} from './siphon-crest';
import { flowWarnings, makeWarning } from './warnings';

export type { CrestInput, ResolvedCrest } from './siphon-crest';
export {
  DEFAULT_CREST_MARGIN_FRACTION,
  crestPressureAt,
  crestStatus,
  defaultCrestLimit,
  maxCrestHeightAt,
  resolveCrest,
  siphonBreakLevel,
  workingCrestPressure,
} from './siphon-crest';

/** Sink level of a request: the outlet, or a tailwater above it. */
function sinkOf(req: SiphonRequest): number {
  const tw = req.tailwater_level_m;
  return tw !== undefined && tw > req.outlet_elevation_m ? tw : req.outlet_elevation_m;
}

/** For the UI: the source level at which this siphon breaks as the source falls (see {@link siphonBreakLevel}). */
export function siphonBreakSourceLevel(req: SiphonRequest): number | null {
  const fluid = resolveFluid(req.fluid);
  const line = resolveLine(req.line);
  levelsOf(req);
  const crest = resolveCrest(line, req, fluid, resolveAtmosphere(req.site));
  return siphonBreakLevel(line, crest, fluid, sinkOf(req), req.source_level_m);
}

function siphonWarnings(status: SiphonResult['status'], base: Warning[]): Warning[] {
  if (status === 'marginal') return [makeWarning('siphon_near_limit'), ...base];
  if (status === 'breaks') return [makeWarning('siphon_breaks'), ...base];
  if (status === 'no_flow') return [makeWarning('no_head')];
  return base;
}

/** POST /api/v1/siphon: flow, crest pressure and verdict of a siphon. */
export function solveSiphon(req: SiphonRequest): SiphonResult {
  const fluid = resolveFluid(req.fluid);
  const atm = resolveAtmosphere(req.site);
  const line = resolveLine(req.line);
  const head = levelsOf(req);
  const crest = resolveCrest(line, req, fluid, atm);
  const st = lineFlowAtHead(line, head, fluid);
  const pc = crestPressureAt(crest, req.source_level_m, st);
  const status = !(head > 0) ? 'no_flow' : crestStatus(crest, pc);
  const flowing = status !== 'no_flow';
  return {
    status,
    head_m: head,
    flow_m3_s: st.flowM3S,
    velocity_m_s: st.velocityMS,
    reynolds: st.reynolds,
    friction_factor: st.frictionFactor,
    regime: st.regime,
    losses_m: flowing
      ? lossesAt(line, st.velocityMS, st.frictionFactor)
      : { entrance: 0, fittings: 0, friction: 0, exit: 0 },
    warnings: siphonWarnings(
      status,
      flowing ? flowWarnings(st.regime, st.reynolds, line.relativeRoughness, st.velocityMS) : [],
    ),
    engine_version: ENGINE_VERSION,
    atmospheric_pressure_pa: atm,
    vapor_pressure_pa: fluid.vapor_pressure_pa,
    crest_pressure_abs_pa: pc,
    crest_limit_pa: crest.limitPa,
    max_crest_height_m: maxCrestHeightAt(crest, st),
    priming_volume_m3: line.areaM2 * line.lengthM * line.parallel,
  };
}
