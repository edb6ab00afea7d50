/**
 * Outlets of a draining vessel, each reduced to a flow law Q(h) over the vessel depth h and the
 * depth at which it stops giving water (its cutoff) with the API v1 stop reason.
 */
import { G } from './constants';
import { drivingHead, lineFlowAtHead, resolveLine } from './line';
import type { LineState, ResolvedLine } from './line';
import { crestPressureAt, defaultCrestLimit, resolveCrest, workingCrestPressure } from './siphon';
import { brentRoot } from './roots';
import type {
  DrainStopReason,
  FluidProps,
  LineOutlet,
  OrificeOutlet,
  OutletInput,
  SiphonOutlet,
} from './types';
import { EngineInputError } from './types';

/** Depth of the 1 mm stand-off from a stop the level only approaches asymptotically, m (API v1). */
export const ASYMPTOTIC_STANDOFF_M = 0.001;

export interface OutletModel {
  /** 'orifice' | 'line' | 'siphon'. */
  type: OutletInput['type'];
  /** Dotted path of the outlet in the request. */
  path: string;
  /** Flow at vessel depth h, m³/s, ignoring the cutoff (0 when there is no head). */
  flow(h: number): number;
  /** Depth at and below which the outlet gives no water, m (≥ 0). */
  cutoff: number;
  reason: DrainStopReason;
  /** True when Q → 0 at the cutoff fast enough that the level never reaches it (Q ∝ Δh or faster). */
  asymptotic: boolean;
  /** Line state at depth h (line and siphon outlets only), for warnings. */
  state?(h: number): LineState;
  /** The resolved line (line and siphon outlets only). */
  line?: ResolvedLine;
  /** Siphon only: it starts with its crest below the practical default limit (a lower limit was given). */
  nearLimitAtStart?: boolean;
}

export interface OutletContext {
  fluid: FluidProps;
  atmosphericPa: number;
  bottomM: number;
  initialDepthM: number;
}

function finite(v: unknown, path: string): number {
  if (typeof v !== 'number' || !Number.isFinite(v))
    throw new EngineInputError(path, 'must be a number');
  return v;
}

function optional(
  v: number | undefined,
  dflt: number,
  path: string,
  ok: (x: number) => boolean,
  rule: string,
): number {
  if (v === undefined) return dflt;
  if (!(typeof v === 'number' && Number.isFinite(v) && ok(v)))
    throw new EngineInputError(path, `must be ${rule}`);
  return v;
}

/**
 * Orifice (Torricelli with a discharge coefficient): Q = n·Cd·(πd²/4)·√(2g·h_o), h_o the depth of
 * the surface above the orifice, m. d > 0 m; 0 < Cd ≤ 1 (about 0.61 sharp-edged, common practice);
 * n ≥ 1 identical orifices. Source: Torricelli (1643) with an empirical Cd, any hydraulics text.
 */
function orificeModel(o: OrificeOutlet, path: string, ctx: OutletContext): OutletModel {
  const d = optional(o.diameter_m, NaN, `${path}.diameter_m`, (x) => x > 0, 'a number > 0');
  if (Number.isNaN(d)) throw new EngineInputError(`${path}.diameter_m`, 'is required');
  const cd = optional(
    o.discharge_coefficient,
    0.61,
    `${path}.discharge_coefficient`,
    (x) => x > 0 && x <= 1,
    'between 0 and 1',
  );
  const n = optional(
    o.count,
    1,
    `${path}.count`,
    (x) => Number.isInteger(x) && x >= 1,
    'an integer ≥ 1',
  );
  const depthO =
    optional(o.elevation_m, ctx.bottomM, `${path}.elevation_m`, () => true, 'a number') -
    ctx.bottomM;
  const k = n * cd * ((Math.PI * d * d) / 4) * Math.sqrt(2 * G);
  return {
    type: 'orifice',
    path,
    flow: (h) => (h > depthO ? k * Math.sqrt(h - depthO) : 0),
    cutoff: Math.max(0, depthO),
    reason: 'intake_uncovered',
    asymptotic: false,
  };
}

/** Local exponent p of Q ∝ (h − c)^p just above a zero-head cutoff; p ≥ 0.75 means asymptotic. */
function isAsymptotic(flow: (h: number) => number, c: number): boolean {
  const q1 = flow(c + 1e-6);
  const q2 = flow(c + 2e-6);
  return q1 > 0 && Math.log(q2 / q1) / Math.LN2 >= 0.75;
}

/** Shared part of line and siphon outlets: flow law, intake and zero-head cutoffs. */
function lineModel(o: LineOutlet | SiphonOutlet, path: string, ctx: OutletContext): OutletModel {
  const line = resolveLine(o.line, `${path}.line`);
  const outlet = finite(o.outlet_elevation_m, `${path}.outlet_elevation_m`);
  const tail =
    o.tailwater_level_m === undefined
      ? undefined
      : finite(o.tailwater_level_m, `${path}.tailwater_level_m`);
  const intake =
    o.intake_elevation_m === undefined && o.type === 'line'
      ? ctx.bottomM
      : finite(o.intake_elevation_m, `${path}.intake_elevation_m`);
  const scratch: LineState = {
    velocityMS: 0,
    flowM3S: 0,
    reynolds: 0,
    frictionFactor: 0,
    regime: 'laminar',
  };
  const state = (h: number): LineState =>
    lineFlowAtHead(line, drivingHead(ctx.bottomM + h, outlet, tail), ctx.fluid, scratch);
  const flow = (h: number): number => state(h).flowM3S;
  const zeroHead = -drivingHead(ctx.bottomM, outlet, tail); // depth where the head is zero
  const intakeDepth = intake - ctx.bottomM;
  const noHead = zeroHead >= intakeDepth;
  const cutoff = Math.max(0, noHead ? zeroHead : intakeDepth);
  const asymptotic = noHead && zeroHead >= 0 && isAsymptotic(flow, zeroHead);
  return {
    type: o.type,
    path,
    flow,
    cutoff,
    reason: noHead ? 'no_head' : 'intake_uncovered',
    asymptotic,
    state,
    line,
  };
}

/**
 * Siphon: the line's flow law plus the crest check. The highest depth at which the crest
 * pressure falls to its working pressure (the limit, and never below the vapour pressure; found
 * by a scan from the top and a bracketed root) becomes the cutoff with reason `siphon_breaks`
 * when it lies above the line's own cutoff.
 */
function siphonModel(o: SiphonOutlet, path: string, ctx: OutletContext): OutletModel {
  const m = lineModel(o, path, ctx);
  const crest = resolveCrest(m.line!, o, ctx.fluid, ctx.atmosphericPa, path);
  // The run stops at the limit, or at the vapour pressure when the limit is below it.
  const floor = workingCrestPressure(crest.limitPa, crest.vaporPa);
  const excess = (h: number): number =>
    crestPressureAt(crest, ctx.bottomM + h, m.state!(h)) - floor;
  const top = ctx.initialDepthM;
  if (m.cutoff >= top) return m;
  const startPa = crestPressureAt(crest, ctx.bottomM + top, m.state!(top));
  m.nearLimitAtStart = startPa < defaultCrestLimit(ctx.atmosphericPa, ctx.fluid.vapor_pressure_pa);
  if (excess(top) <= 0)
    return { ...m, cutoff: Math.max(m.cutoff, top), reason: 'siphon_breaks', asymptotic: false };
  const steps = 32;
  let hi = top;
  for (let i = 1; i <= steps; i++) {
    const lo = top - ((top - m.cutoff) * i) / steps;
    if (excess(lo) <= 0) {
      const hb = brentRoot(excess, lo, hi, 1e-9 * Math.max(1, top));
      return { ...m, cutoff: hb, reason: 'siphon_breaks', asymptotic: false };
    }
    hi = lo;
  }
  return m;
}

/** Flow laws for the request's outlet or outlets. */
export function outletModels(
  outlet: OutletInput | OutletInput[],
  ctx: OutletContext,
): OutletModel[] {
  const list = Array.isArray(outlet) ? outlet : [outlet];
  if (list.length < 1 || list.length > 20)
    throw new EngineInputError('outlet', 'give 1 to 20 outlets');
  return list.map((o, i) => {
    const path = Array.isArray(outlet) ? `outlet.${i}` : 'outlet';
    if (!o || typeof o !== 'object') throw new EngineInputError(path, 'is required');
    if (o.type === 'orifice') return orificeModel(o, path, ctx);
    if (o.type === 'line') return lineModel(o, path, ctx);
    if (o.type === 'siphon') return siphonModel(o, path, ctx);
    throw new EngineInputError(`${path}.type`, 'must be orifice, line or siphon');
  });
}
