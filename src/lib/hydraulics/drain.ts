/**
 * POST /api/v1/drain: quasi-steady drain-down of a vessel, basin or pond through one or several
 * outlets. At each level every working outlet carries its steady flow at that head,
 * dV/dt = −ΣQ(h); time is integrated over depth, t = ∫ A(h)/ΣQ(h) dh (see drain-integrate.ts).
 * An outlet stops at its cutoff (intake or orifice uncovered, no head, siphon crest pressure at
 * its limit) and the others carry on; the run ends at the final depth or when the last stops.
 */
import { ENGINE_VERSION } from './constants';
import { drainTimes } from './drain-integrate';
import { ASYMPTOTIC_STANDOFF_M, outletModels } from './drain-outlets';
import type { OutletModel } from './drain-outlets';
import { drainWarnings } from './drain-warnings';
import { resolveAtmosphere, resolveFluid } from './fluid';
import type { DrainCurvePoint, DrainRequest, DrainResult, DrainStopReason } from './types';
import { EngineInputError } from './types';
import { vesselGeometry } from './vessels';

export interface DrainStop {
  depth: number;
  reason: DrainStopReason;
  /** The level only approaches the stop, so the run ends 1 mm above it. */
  asymptotic: boolean;
  /** No outlet gives water at the initial depth. */
  noFlow: boolean;
}

interface DrainInputs {
  bottomM: number;
  h0: number;
  hf: number;
  rows: number;
}

function numberIn(
  v: unknown,
  dflt: number | undefined,
  path: string,
  ok: (x: number) => boolean,
  rule: string,
): number {
  if (v === undefined && dflt !== undefined) return dflt;
  if (typeof v !== 'number' || !Number.isFinite(v) || !ok(v))
    throw new EngineInputError(path, `must be ${rule}`);
  return v;
}

function drainInputs(req: DrainRequest, maxDepth: number): DrainInputs {
  const bottomM = numberIn(req.bottom_elevation_m, 0, 'bottom_elevation_m', () => true, 'a number');
  const h0 = numberIn(
    req.initial_depth_m,
    undefined,
    'initial_depth_m',
    (x) => x > 0 && x <= maxDepth * (1 + 1e-12),
    'greater than 0 and no more than the vessel depth',
  );
  const hf = numberIn(
    req.final_depth_m,
    0,
    'final_depth_m',
    (x) => x >= 0 && x < h0,
    'at least 0 and below the initial depth',
  );
  const rows = numberIn(
    req.curve_points,
    100,
    'curve_points',
    (x) => Number.isInteger(x) && x >= 2 && x <= 2000,
    'an integer from 2 to 2000',
  );
  return { bottomM, h0: Math.min(h0, maxDepth), hf, rows };
}

/** First stop of the run: the final depth, or the lowest outlet cutoff (+1 mm if asymptotic). */
export function drainStop(outlets: OutletModel[], h0: number, hf: number): DrainStop {
  const min = Math.min(...outlets.map((o) => o.cutoff));
  const atMin = outlets.filter((o) => o.cutoff === min);
  const asymptotic = atMin.every((o) => o.asymptotic);
  // A final depth above an asymptotic stop is still reached in finite time.
  if (hf > min || (hf === min && !asymptotic)) {
    return { depth: hf, reason: 'final_depth', asymptotic: false, noFlow: false };
  }
  const depth = min + (asymptotic ? ASYMPTOTIC_STANDOFF_M : 0);
  return { depth, reason: atMin[0].reason, asymptotic, noFlow: depth >= h0 };
}

/** Total flow at depth h of the outlets that started and have not yet stopped, m³/s. */
function flowAt(outlets: OutletModel[], h: number, h0: number): number {
  let q = 0;
  for (const o of outlets) if (o.cutoff <= h && o.cutoff < h0) q += o.flow(h);
  return q;
}

/** Evenly spaced depths from h0 down to hs, exact at both ends. */
function rowDepths(h0: number, hs: number, n: number): number[] {
  return Array.from({ length: n }, (_, k) => (k === n - 1 ? hs : h0 - ((h0 - hs) * k) / (n - 1)));
}

/** Quasi-steady drain-down per API v1 (several outlets allowed). */
export function solveDrain(req: DrainRequest): DrainResult {
  const fluid = resolveFluid(req.fluid);
  const atmosphericPa = resolveAtmosphere(req.site);
  if (!req.vessel || typeof req.vessel !== 'object')
    throw new EngineInputError('vessel', 'is required');
  const geom = vesselGeometry(req.vessel);
  const inp = drainInputs(req, geom.maxDepth);
  const ctx = { fluid, atmosphericPa, bottomM: inp.bottomM, initialDepthM: inp.h0 };
  const outlets = outletModels(req.outlet, ctx);
  const stop = drainStop(outlets, inp.h0, inp.hf);
  const hs = stop.noFlow ? inp.h0 : stop.depth;
  const depths = rowDepths(inp.h0, hs, inp.rows);
  const times = stop.noFlow ? depths.map(() => 0) : drainTimes(geom, outlets, depths);
  const curve: DrainCurvePoint[] = depths.map((d, k) => ({
    time_s: times[k],
    depth_m: d,
    flow_m3_s: stop.noFlow ? 0 : flowAt(outlets, d, inp.h0),
    volume_m3: geom.volume(d),
  }));
  const volumeInitial = curve[0].volume_m3;
  const volumeLeft = curve[curve.length - 1].volume_m3;
  const timeS = times[times.length - 1];
  return {
    status: stop.noFlow ? 'no_flow' : stop.reason === 'final_depth' ? 'drains' : 'stops_early',
    stop_reason: stop.reason,
    time_s: timeS,
    stop_depth_m: hs,
    volume_initial_m3: volumeInitial,
    volume_drained_m3: volumeInitial - volumeLeft,
    volume_left_m3: volumeLeft,
    initial_flow_m3_s: curve[0].flow_m3_s,
    mean_flow_m3_s: timeS > 0 ? (volumeInitial - volumeLeft) / timeS : 0,
    curve,
    warnings: drainWarnings(outlets, stop, inp.h0, timeS),
    engine_version: ENGINE_VERSION,
  };
}
