import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { solveDrain } from '../../../src/lib/hydraulics/drain';
import type { DrainRequest, OutletInput, VesselInput } from '../../../src/lib/hydraulics/types';

const len = (min: number, max: number): fc.Arbitrary<number> =>
  fc.double({ min, max, noNaN: true });

const vessel: fc.Arbitrary<VesselInput> = fc.oneof(
  fc.record({
    shape: fc.constant('box' as const),
    length_m: len(0.5, 20),
    width_m: len(0.5, 20),
    depth_m: len(0.5, 4),
  }),
  fc.record({
    shape: fc.constant('vertical_cylinder' as const),
    diameter_m: len(0.3, 10),
    depth_m: len(0.5, 4),
  }),
  fc.record({
    shape: fc.constant('horizontal_cylinder' as const),
    diameter_m: len(0.5, 4),
    length_m: len(1, 15),
  }),
  fc.record({ shape: fc.constant('sphere' as const), diameter_m: len(0.5, 5) }),
  fc.record({
    shape: fc.constant('sloped_pond' as const),
    bottom_length_m: len(1, 30),
    bottom_width_m: len(1, 30),
    side_slope_h_per_v: len(0, 4),
    depth_m: len(0.5, 3),
  }),
  fc.array(len(0.5, 80), { minLength: 2, maxLength: 40 }).map((areas) => ({
    shape: 'stage_table' as const,
    points: areas.map((a, i) => ({ depth_m: i * 0.1, area_m2: a })),
  })),
);

const outlet: fc.Arbitrary<OutletInput> = fc.oneof(
  fc.record({
    type: fc.constant('orifice' as const),
    diameter_m: len(0.01, 0.2),
    elevation_m: len(-0.2, 0.6),
  }),
  fc.record({
    type: fc.constant('line' as const),
    line: fc.record({
      inner_diameter_m: len(0.01, 0.2),
      length_m: len(0, 200),
      roughness_m: len(0, 1e-4),
    }),
    intake_elevation_m: len(0, 0.5),
    outlet_elevation_m: len(-5, 1),
  }),
  fc.record({
    type: fc.constant('siphon' as const),
    line: fc.record({
      inner_diameter_m: len(0.01, 0.1),
      length_m: len(5, 100),
      roughness_m: len(0, 1e-4),
    }),
    intake_elevation_m: len(0, 0.3),
    crest_elevation_m: len(1, 9),
    length_to_crest_m: len(0, 5),
    outlet_elevation_m: len(-6, -0.5),
  }),
);

/** A drain request whose initial depth is a fraction of the vessel's full depth. */
const request: fc.Arbitrary<DrainRequest> = fc
  .record({
    vessel,
    outlets: fc.array(outlet, { minLength: 1, maxLength: 3 }),
    fill: len(0.2, 1),
    rows: fc.integer({ min: 2, max: 200 }),
  })
  .map(({ vessel: v, outlets, fill, rows }) => {
    const full =
      'depth_m' in v
        ? v.depth_m
        : 'diameter_m' in v
          ? v.diameter_m
          : v.points[v.points.length - 1].depth_m;
    return { vessel: v, initial_depth_m: fill * full, outlet: outlets, curve_points: rows };
  });

// A generous time-out guards against a hang on a shared, busy machine; it is not a speed goal.
const TIMEOUT_MS = 60_000;

describe('solveDrain properties', () => {
  test(
    'keeps drained + remaining = initial volume (within 1e-12 relative)',
    () => {
      fc.assert(
        fc.property(request, (req) => {
          const r = solveDrain(req);
          const sum = r.volume_drained_m3 + r.volume_left_m3;
          expect(Math.abs(sum - r.volume_initial_m3)).toBeLessThanOrEqual(
            1e-12 * r.volume_initial_m3,
          );
          expect(r.volume_drained_m3).toBeGreaterThanOrEqual(0);
        }),
        { numRuns: 120 },
      );
    },
    TIMEOUT_MS,
  );

  test(
    'gives a monotone curve: depth and volume fall while time rises',
    () => {
      fc.assert(
        fc.property(request, (req) => {
          const r = solveDrain(req);
          expect(r.curve).toHaveLength(req.curve_points ?? 100);
          expect(r.curve[0].time_s).toBe(0);
          // First row that breaks monotony (−1 when none), checked in plain code for speed.
          const bad =
            r.status === 'no_flow'
              ? -1
              : r.curve.findIndex((b, k) => {
                  if (k === 0) return false;
                  const a = r.curve[k - 1];
                  const ok =
                    b.depth_m < a.depth_m && b.time_s > a.time_s && b.volume_m3 <= a.volume_m3;
                  return !(ok && Number.isFinite(b.time_s));
                });
          expect(bad).toBe(-1);
          expect(r.curve[r.curve.length - 1].depth_m).toBe(r.stop_depth_m);
        }),
        { numRuns: 120 },
      );
    },
    TIMEOUT_MS,
  );
});
