/**
 * Contract of POST /api/v1/siphon (shared/api-v1.md): fields, defaults, the four statuses, the
 * engine wiring, and an outside check (Torricelli's jet and Bernoulli's crest pressure for a
 * loss-free siphon, closed form).
 */
import { beforeAll, describe, expect, test } from 'vitest';
import { solveSiphon } from '../../src/lib/hydraulics';
import { G } from '../../src/lib/hydraulics/constants';
import { siphonResultSchema } from '../../src/lib/api/schemas-responses';
import { POST } from '../../src/pages/api/v1/siphon';
import { postJson } from './call-route';
import { siphonRequest, withField } from './samples';

beforeAll(() => {
  process.env.CALC_RATE_LIMIT_PER_MINUTE = '0';
});

const call = (body: unknown): ReturnType<typeof postJson> => postJson(POST, '/api/v1/siphon', body);

/** Invented liquid and barometer so the pressures are round: ρ 1000, p_v 2000 Pa, p_atm 100 kPa. */
const plain = {
  ...siphonRequest,
  fluid: { density_kg_m3: 1000, viscosity_pa_s: 0.001, vapor_pressure_pa: 2000 },
  site: { atmospheric_pressure_pa: 100_000 },
};

describe('POST /api/v1/siphon', () => {
  test('answers 200 with exactly the spec’s fields', async () => {
    const { status, json } = await call(siphonRequest);
    expect(status).toBe(200);
    expect(() => siphonResultSchema.parse(json)).not.toThrow();
  });

  test('returns the engine’s result for the same input (wiring check)', async () => {
    expect((await call(siphonRequest)).json).toEqual(solveSiphon(structuredClone(siphonRequest)));
  });

  test('defaults minor_loss_k_to_crest to 0 and the crest limit to p_v + 20 % of (p_atm − p_v)', async () => {
    const implicit = await call(plain);
    const explicit = await call({
      ...plain,
      minor_loss_k_to_crest: 0,
      min_crest_pressure_pa: 21_600,
    });
    expect(implicit.json.crest_limit_pa).toBeCloseTo(2000 + 0.2 * 98_000, 9);
    expect(implicit.json).toEqual(explicit.json);
  });

  test('uses min_crest_pressure_pa when given', async () => {
    const { json } = await call({ ...plain, min_crest_pressure_pa: 40_000 });
    expect(json.crest_limit_pa).toBe(40_000);
  });

  test('answers runs, marginal, breaks and no_flow by crest pressure and head', async () => {
    const at = async (crest: number, limit?: number): Promise<Record<string, unknown>> =>
      (await call({ ...plain, crest_elevation_m: crest, min_crest_pressure_pa: limit })).json;
    const runs = await at(3);
    expect(runs.status).toBe('runs');
    expect(runs.crest_pressure_abs_pa as number).toBeGreaterThanOrEqual(
      runs.crest_limit_pa as number,
    );
    const marginal = await at(3, (runs.crest_pressure_abs_pa as number) + 1);
    expect(marginal.status).toBe('marginal');
    expect((marginal.warnings as { code: string }[])[0].code).toBe('siphon_near_limit');
    const breaks = await at(11);
    expect(breaks.status).toBe('breaks');
    expect(breaks.crest_pressure_abs_pa as number).toBeLessThan(2000);
    expect((breaks.warnings as { code: string }[])[0].code).toBe('siphon_breaks');
    const none = (await call({ ...plain, outlet_elevation_m: 2.5 })).json;
    expect(none).toMatchObject({ status: 'no_flow', flow_m3_s: 0, velocity_m_s: 0 });
  });

  test('matches Torricelli and Bernoulli for a loss-free siphon (closed form, 1e-9)', async () => {
    // No length, no entrance or fittings loss: V = √(2gH); at the crest (right at the intake)
    // p = p_atm − ρg(z_c − z_s) − ρV²/2; max crest height = (p_atm − p_v − ρV²/2)/(ρg).
    const h = 2.5,
      d = 0.05,
      zc = 3,
      zs = 2;
    const req = {
      ...plain,
      line: { inner_diameter_m: d, length_m: 0, roughness_m: 0, entrance_k: 0 },
      source_level_m: zs,
      outlet_elevation_m: zs - h,
      crest_elevation_m: zc,
      length_to_crest_m: 0,
    };
    const { json } = await call(req);
    const v = Math.sqrt(2 * G * h);
    const rel = (a: unknown, b: number): number => Math.abs((a as number) - b) / Math.abs(b);
    expect(rel(json.velocity_m_s, v)).toBeLessThan(1e-9);
    expect(
      rel(json.crest_pressure_abs_pa, 100_000 - 1000 * G * (zc - zs) - 500 * v * v),
    ).toBeLessThan(1e-9);
    expect(rel(json.max_crest_height_m, (98_000 - 500 * v * v) / (1000 * G))).toBeLessThan(1e-9);
    expect(json.priming_volume_m3).toBe(0);
  });

  test('reports the priming volume of every line, πD²/4·L·n (geometry)', async () => {
    const { json } = await call(withField(siphonRequest, 'line.parallel_lines', 2));
    expect(json.priming_volume_m3).toBeCloseTo((Math.PI * 0.0381 ** 2 * 25 * 2) / 4, 12);
  });

  test('rejects a crest run longer than the line and crest K above the line’s K, naming the field', async () => {
    const long = await call({ ...siphonRequest, length_to_crest_m: 30 });
    expect(long.status).toBe(400);
    expect((long.json.issues as { path: string }[])[0].path).toBe('length_to_crest_m');
    const k = await call({ ...siphonRequest, minor_loss_k_to_crest: 1 });
    expect((k.json.issues as { path: string }[])[0].path).toBe('minor_loss_k_to_crest');
  });
});
