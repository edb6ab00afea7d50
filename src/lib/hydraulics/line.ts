/**
 * Gravity line: steady full-pipe flow from a free surface to an outlet by the energy equation
 * H = (1 + K_entrance + ΣK + f·L/D)·V²/(2g) (Darcy–Weisbach friction, K-method minor losses).
 */
import type {
  FluidProps,
  LineInput,
  LineRequest,
  LineResult,
  LossBreakdown,
  Regime,
} from './types';
import { EngineInputError } from './types';
import { ENGINE_VERSION, G } from './constants';
import { findFitting, findMaterial } from './catalog';
import { resolveAtmosphere, resolveFluid } from './fluid';
import { colebrookWhite, RE_TURBULENT_MIN } from './friction';
import { makeWarning, flowWarnings } from './warnings';
import { solveVelocity } from './line-velocity';

/** A line with every default applied and every catalogue id looked up (SI). */
export interface ResolvedLine {
  diameterM: number;
  lengthM: number;
  roughnessM: number;
  relativeRoughness: number;
  /** ΣK of fittings along the line (minor_loss_k plus catalogue fittings), entrance and exit excluded. */
  fittingsK: number;
  entranceK: number;
  parallel: number;
  /** Bore area of one line, m². */
  areaM2: number;
  /** 1 + entrance K + ΣK: every loss that scales with V²/2g apart from friction. */
  kMinorTotal: number;
  /** L/D. */
  lengthOverD: number;
  /** Colebrook–White f at Re = 4000 for this ε/D (end of the transition rule). */
  f4000: number;
}

/** Steady flow state of one resolved line at one head. */
export interface LineState {
  /** Mean velocity in one line, m/s. */
  velocityMS: number;
  /** Flow of all parallel lines together, m³/s. */
  flowM3S: number;
  reynolds: number;
  frictionFactor: number;
  regime: Regime;
}

const num = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function field(v: unknown, path: string, ok: (x: number) => boolean, rule: string): number {
  if (!num(v) || !ok(v)) throw new EngineInputError(path, `must be ${rule}`);
  return v;
}

function roughnessOf(line: LineInput, d: number, path: string): number {
  const hasR = line.roughness_m !== undefined;
  if (hasR === (line.material !== undefined)) {
    throw new EngineInputError(path, 'give exactly one of roughness_m or material');
  }
  if (hasR)
    return field(
      line.roughness_m,
      `${path}.roughness_m`,
      (x) => x >= 0 && x < d,
      '≥ 0 and less than the inner diameter',
    );
  const m = typeof line.material === 'string' ? findMaterial(line.material) : undefined;
  if (!m) throw new EngineInputError(`${path}.material`, 'is not a material in the catalogue');
  return m.roughness_m;
}

function fittingsKOf(line: LineInput, path: string): number {
  let k =
    line.minor_loss_k === undefined
      ? 0
      : field(line.minor_loss_k, `${path}.minor_loss_k`, (x) => x >= 0, '≥ 0');
  if (line.fittings === undefined) return k;
  if (!Array.isArray(line.fittings))
    throw new EngineInputError(`${path}.fittings`, 'must be a list');
  line.fittings.forEach((item, i) => {
    const p = `${path}.fittings.${i}`;
    const fit = item && typeof item.id === 'string' ? findFitting(item.id) : undefined;
    if (!fit) throw new EngineInputError(`${p}.id`, 'is not a fitting in the catalogue');
    if (fit.kind !== 'fitting') {
      throw new EngineInputError(
        `${p}.id`,
        `is an ${fit.kind}; entrances go in entrance_k and the exit is already counted`,
      );
    }
    k +=
      fit.k *
      field(item.count, `${p}.count`, (x) => Number.isInteger(x) && x >= 1, 'an integer ≥ 1');
  });
  return k;
}

/**
 * Apply API v1 defaults and ranges to a line and look up its catalogue ids.
 * @param path dotted path of the line in the request, for error messages.
 * @throws EngineInputError naming the offending field.
 */
export function resolveLine(line: LineInput, path = 'line'): ResolvedLine {
  if (!line || typeof line !== 'object') throw new EngineInputError(path, 'is required');
  const d = field(
    line.inner_diameter_m,
    `${path}.inner_diameter_m`,
    (x) => x > 0 && x <= 5,
    '> 0 and ≤ 5 m',
  );
  const l = field(
    line.length_m,
    `${path}.length_m`,
    (x) => x >= 0 && x <= 100_000,
    'between 0 and 100 000 m',
  );
  const eps = roughnessOf(line, d, path);
  const fittingsK = fittingsKOf(line, path);
  const entranceK =
    line.entrance_k === undefined
      ? 0.5
      : field(line.entrance_k, `${path}.entrance_k`, (x) => x >= 0, '≥ 0');
  const parallel =
    line.parallel_lines === undefined
      ? 1
      : field(
          line.parallel_lines,
          `${path}.parallel_lines`,
          (x) => Number.isInteger(x) && x >= 1 && x <= 50,
          'an integer from 1 to 50',
        );
  const rr = eps / d;
  return {
    diameterM: d,
    lengthM: l,
    roughnessM: eps,
    relativeRoughness: rr,
    fittingsK,
    entranceK,
    parallel,
    areaM2: (Math.PI * d * d) / 4,
    kMinorTotal: 1 + entranceK + fittingsK,
    lengthOverD: l / d,
    f4000: colebrookWhite(RE_TURBULENT_MIN, rr),
  };
}

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
