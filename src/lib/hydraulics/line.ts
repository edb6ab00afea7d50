/**
 * Gravity line: steady full-pipe flow from a free surface to an outlet by the energy equation
 * H = (1 + K_entrance + ΣK + f·L/D)·V²/(2g) (Darcy–Weisbach friction, K-method minor losses).
 */
import type { FluidProps, LineRequest, LineResult, LossBreakdown } from './types';
import { ENGINE_VERSION, G } from './constants';
import { resolveAtmosphere, resolveFluid } from './fluid';
import type { LineState, ResolvedLine } from './line-resolve';
import { field, resolveLine } from './line-resolve';
import { makeWarning, flowWarnings } from './warnings';
import { solveVelocity } from './line-velocity';

export type { LineState, ResolvedLine } from './line-resolve';
export { resolveLine } from './line-resolve';

/**
 * Steady flow of a resolved line under a head, by the energy equation
 * H = (1 + K_entrance + ΣK + f·L/D)·V²/(2g), f from {@link frictionFactor}'s rules.
 * Solved by a safeguarded Newton iteration on V (closed form when laminar).
 *
 * @param headM driving head H, m (≤ 0 gives zero flow).
 * @param fluid density kg/m³, viscosity Pa·s.
 * @param out optional object to fill instead of allocating a new one (for drain-down loops).
 */
export function lineFlowAtHead(
  line: ResolvedLine,
  headM: number,
  fluid: FluidProps,
  out?: LineState,
): LineState {
  const s = out ?? { velocityMS: 0, flowM3S: 0, reynolds: 0, frictionFactor: 0, regime: 'laminar' };
  if (!(headM > 0)) {
    s.velocityMS = s.flowM3S = s.reynolds = s.frictionFactor = 0;
    s.regime = 'laminar';
    return s;
  }
  const nu = fluid.viscosity_pa_s / fluid.density_kg_m3;
  solveVelocity(line, headM, nu, s);
  s.flowM3S = s.velocityMS * line.areaM2 * line.parallel;
  return s;
}

/** Head lost in each part at a velocity and friction factor, m. */
export function lossesAt(line: ResolvedLine, velocityMS: number, f: number): LossBreakdown {
  const hv = (velocityMS * velocityMS) / (2 * G);
  return {
    entrance: line.entranceK * hv,
    fittings: line.fittingsK * hv,
    friction: f * line.lengthOverD * hv,
    exit: hv,
  };
}

/**
 * Driving head of a gravity line: source level − outlet elevation, or − tailwater level when a
 * tailwater stands above the outlet, m.
 */
export function drivingHead(
  sourceLevelM: number,
  outletElevationM: number,
  tailwaterLevelM?: number,
): number {
  const sink =
    tailwaterLevelM !== undefined && tailwaterLevelM > outletElevationM
      ? tailwaterLevelM
      : outletElevationM;
  return sourceLevelM - sink;
}

/** Check the request's levels are finite numbers. */
export function levelsOf(req: LineRequest): number {
  field(req.source_level_m, 'source_level_m', () => true, 'a number');
  field(req.outlet_elevation_m, 'outlet_elevation_m', () => true, 'a number');
  if (req.tailwater_level_m !== undefined)
    field(req.tailwater_level_m, 'tailwater_level_m', () => true, 'a number');
  return drivingHead(req.source_level_m, req.outlet_elevation_m, req.tailwater_level_m);
}

/** POST /api/v1/line: flow of a gravity line from its head, with the loss breakdown. */
export function solveLine(req: LineRequest): LineResult {
  const fluid = resolveFluid(req.fluid);
  resolveAtmosphere(req.site); // validated for the API; a full gravity line does not need it
  const line = resolveLine(req.line);
  const head = levelsOf(req);
  const st = lineFlowAtHead(line, head, fluid);
  const runs = head > 0;
  return {
    status: runs ? 'runs' : 'no_flow',
    head_m: head,
    flow_m3_s: st.flowM3S,
    velocity_m_s: st.velocityMS,
    reynolds: st.reynolds,
    friction_factor: st.frictionFactor,
    regime: st.regime,
    losses_m: runs
      ? lossesAt(line, st.velocityMS, st.frictionFactor)
      : { entrance: 0, fittings: 0, friction: 0, exit: 0 },
    warnings: runs
      ? flowWarnings(st.regime, st.reynolds, line.relativeRoughness, st.velocityMS)
      : [makeWarning('no_head')],
    engine_version: ENGINE_VERSION,
  };
}
