import { describe, expect, test } from 'vitest';
import { solveDrain } from '../../../src/lib/hydraulics/drain';
import type { DrainRequest, DrainResult } from '../../../src/lib/hydraulics/types';
import { loadFixture, logMax, relDev } from './reference-fixture';

// Reference: drain-downs integrated independently in Python with scipy.integrate.solve_ivp
// (DOP853, rtol 1e-10, atol 1e-13, terminal event at the stop; box cases also asserted against
// Torricelli's closed form), volumes by scipy.integrate.quad of the shape's area, the line case's
// flow by scipy brentq + fluids Colebrook — via tests/fixtures/drains.json.
// Tolerances: drain time 0.5 %; initial and mean flow 0.5 %; volumes 0.1 %; stop depth 1 mm;
// depth along the curve (engine curve interpolated linearly) within 0.5 % of the initial depth.
interface Row {
  name: string;
  request: DrainRequest;
  expected: Omit<DrainResult, 'status' | 'curve' | 'warnings' | 'engine_version'>;
  samples: { time_s: number; depth_m: number }[];
}
const fx = loadFixture<Row>('drains.json');
const timeDevs: number[] = [];

/** Depth at time t by linear interpolation of a result curve. */
function depthAt(curve: { time_s: number; depth_m: number }[], t: number): number {
  const i = curve.findIndex((p) => p.time_s >= t);
  if (i <= 0) return i === 0 ? curve[0]!.depth_m : curve[curve.length - 1]!.depth_m;
  const a = curve[i - 1]!;
  const b = curve[i]!;
  return a.depth_m + ((b.depth_m - a.depth_m) * (t - a.time_s)) / (b.time_s - a.time_s);
}

describe(`solveDrain against scipy ${fx.libraries.scipy} solve_ivp`, () => {
  test.each(fx.cases.map((c) => [c.name, c] as const))('does %s', (_name, c) => {
    const r = solveDrain(c.request);
    const e = c.expected;
    expect(r.stop_reason).toBe(e.stop_reason);
    timeDevs.push(relDev(r.time_s, e.time_s));
    expect(relDev(r.time_s, e.time_s)).toBeLessThan(5e-3);
    expect(Math.abs(r.stop_depth_m - e.stop_depth_m)).toBeLessThan(1e-3);
    expect(relDev(r.volume_initial_m3, e.volume_initial_m3)).toBeLessThan(1e-3);
    expect(relDev(r.volume_drained_m3, e.volume_drained_m3)).toBeLessThan(1e-3);
    expect(Math.abs(r.volume_left_m3 - e.volume_left_m3)).toBeLessThan(1e-3 * e.volume_initial_m3);
    expect(relDev(r.initial_flow_m3_s, e.initial_flow_m3_s)).toBeLessThan(5e-3);
    expect(relDev(r.mean_flow_m3_s, e.mean_flow_m3_s)).toBeLessThan(5e-3);
    const h0 = c.request.initial_depth_m;
    for (const s of c.samples) {
      expect(Math.abs(depthAt(r.curve, s.time_s) - s.depth_m)).toBeLessThan(5e-3 * h0);
    }
  });

  test('reports the largest drain-time deviation', () => {
    logMax('drain time vs scipy solve_ivp', timeDevs);
    expect(timeDevs.length).toBe(fx.cases.length);
  });
});
