/**
 * Contract of POST /api/v1/drain (shared/api-v1.md): fields, defaults, the curve, every status and
 * stop reason, the engine wiring, and outside checks (Torricelli's closed-form drain time;
 * vessel volumes from elementary solid geometry).
 */
import { beforeAll, describe, expect, test } from 'vitest';
import { solveDrain } from '../../src/lib/hydraulics';
import { G } from '../../src/lib/hydraulics/constants';
import { drainResultSchema } from '../../src/lib/api/schemas-responses';
import { POST } from '../../src/pages/api/v1/drain';
import { postJson } from './call-route';
import { drainRequest } from './samples';

beforeAll(() => {
  process.env.CALC_RATE_LIMIT_PER_MINUTE = '0';
});

const call = (body: unknown): ReturnType<typeof postJson> => postJson(POST, '/api/v1/drain', body);
const codes = (json: Record<string, unknown>): string[] =>
  (json.warnings as { code: string }[]).map((w) => w.code);

const hose = { inner_diameter_m: 0.0508, length_m: 30, material: 'layflat-hose' };

describe('POST /api/v1/drain', () => {
  test('answers 200 with exactly the spec’s fields', async () => {
    const { status, json } = await call(drainRequest);
    expect(status).toBe(200);
    expect(() => drainResultSchema.parse(json)).not.toThrow();
  });

  test('returns the engine’s result for the same input (wiring check)', async () => {
    expect((await call(drainRequest)).json).toEqual(
      solveDrain(structuredClone(drainRequest) as never),
    );
  });

  test('matches Torricelli’s drain time for a box, t = (A/(Cd·a))·√(2/g)·(√h₀ − √h_f) (1e-6)', async () => {
    const a = (Math.PI * 0.05 ** 2) / 4;
    const t = (12 / (0.61 * a)) * Math.sqrt(2 / G) * (Math.sqrt(1.8) - Math.sqrt(0.05));
    const { json } = await call(drainRequest);
    expect(json).toMatchObject({
      status: 'drains',
      stop_reason: 'final_depth',
      stop_depth_m: 0.05,
    });
    expect(Math.abs((json.time_s as number) - t) / t).toBeLessThan(1e-6);
  });

  test('returns curve_points rows, the first at t = 0 and the last at the stop', async () => {
    const { json } = await call(drainRequest);
    const curve = json.curve as { time_s: number; depth_m: number; volume_m3: number }[];
    expect(curve).toHaveLength(11);
    expect(curve[0]).toMatchObject({ time_s: 0, depth_m: 1.8 });
    expect(curve[10].time_s).toBe(json.time_s);
    expect(curve[10].depth_m).toBe(json.stop_depth_m);
    expect(curve[0].volume_m3).toBeCloseTo(21.6, 12);
  });

  test('applies the spec defaults: bottom 0, final depth 0, 100 rows, Cd 0.61, one orifice at the bottom', async () => {
    const implicit = { ...drainRequest, final_depth_m: undefined, curve_points: undefined };
    const explicit = {
      ...drainRequest,
      bottom_elevation_m: 0,
      final_depth_m: 0,
      curve_points: 100,
      outlet: {
        type: 'orifice',
        diameter_m: 0.05,
        discharge_coefficient: 0.61,
        elevation_m: 0,
        count: 1,
      },
    };
    const a = await call(implicit);
    expect((a.json.curve as unknown[]).length).toBe(100);
    expect(a.json).toEqual((await call(explicit)).json);
  });

  test('defaults a line outlet’s intake to the vessel bottom', async () => {
    const base = { ...drainRequest, bottom_elevation_m: 10, final_depth_m: 0.2 };
    const outlet = { type: 'line', line: hose, outlet_elevation_m: 8 };
    const a = await call({ ...base, outlet });
    const b = await call({ ...base, outlet: { ...outlet, intake_elevation_m: 10 } });
    expect(a.status).toBe(200);
    expect(a.json).toEqual(b.json);
  });

  test('stops at an orifice above the bottom: stops_early, intake_uncovered', async () => {
    const { json } = await call({
      ...drainRequest,
      outlet: { type: 'orifice', diameter_m: 0.05, elevation_m: 0.5 },
    });
    expect(json).toMatchObject({
      status: 'stops_early',
      stop_reason: 'intake_uncovered',
      stop_depth_m: 0.5,
    });
  });

  test('stops 1 mm above the level where a line loses its head: no_head, with a warning', async () => {
    const { json } = await call({
      ...drainRequest,
      outlet: { type: 'line', line: hose, outlet_elevation_m: 0.4 },
    });
    expect(json).toMatchObject({ status: 'stops_early', stop_reason: 'no_head' });
    expect(json.stop_depth_m as number).toBeCloseTo(0.401, 9);
    expect(codes(json)).toContain('asymptotic_stop');
  });

  test('stops where a siphon’s crest pressure reaches its limit: siphon_breaks', async () => {
    const { json } = await call({
      ...drainRequest,
      outlet: {
        type: 'siphon',
        line: hose,
        intake_elevation_m: 0,
        crest_elevation_m: 7.5,
        length_to_crest_m: 10,
        outlet_elevation_m: -3,
      },
    });
    expect(json).toMatchObject({ status: 'stops_early', stop_reason: 'siphon_breaks' });
    expect(json.stop_depth_m as number).toBeGreaterThan(0.05);
    expect(json.stop_depth_m as number).toBeLessThan(1.8);
  });

  test('answers no_flow when the outlet is above the water from the start', async () => {
    const { json } = await call({
      ...drainRequest,
      outlet: { type: 'orifice', diameter_m: 0.05, elevation_m: 1.9 },
    });
    expect(json).toMatchObject({
      status: 'no_flow',
      time_s: 0,
      volume_drained_m3: 0,
      initial_flow_m3_s: 0,
    });
  });

  test('accepts every vessel shape with its solid-geometry volume (elementary geometry, 1e-9)', async () => {
    const r = 1.5,
      h = 1.2;
    const shapes: [Record<string, unknown>, number][] = [
      [{ shape: 'vertical_cylinder', diameter_m: 3, depth_m: 2 }, Math.PI * r * r * h],
      [{ shape: 'sphere', diameter_m: 3 }, (Math.PI * h * h * (3 * r - h)) / 3],
      [
        { shape: 'horizontal_cylinder', diameter_m: 3, length_m: 2 },
        2 * (r * r * Math.acos((r - h) / r) - (r - h) * Math.sqrt(2 * r * h - h * h)),
      ],
      [
        { shape: 'cone_bottom', diameter_m: 3, cone_height_m: 1, depth_m: 2 },
        Math.PI * r * r * (1 / 3 + 0.2),
      ],
      [
        {
          shape: 'sloped_pond',
          bottom_length_m: 4,
          bottom_width_m: 2,
          side_slope_h_per_v: 2,
          depth_m: 2,
        },
        4 * 2 * h + 2 * 6 * h * h + (4 / 3) * 4 * h ** 3,
      ],
      [
        {
          shape: 'stage_table',
          points: [
            { depth_m: 0, area_m2: 10 },
            { depth_m: 2, area_m2: 30 },
          ],
        },
        10 * h + (10 / 2) * h * h,
      ],
    ];
    for (const [vessel, volume] of shapes) {
      const { status, json } = await call({ ...drainRequest, vessel, initial_depth_m: h });
      expect(status, String(vessel.shape)).toBe(200);
      expect(
        Math.abs((json.volume_initial_m3 as number) - volume) / volume,
        String(vessel.shape),
      ).toBeLessThan(1e-9);
    }
  });
});
