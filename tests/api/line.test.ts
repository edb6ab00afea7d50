/**
 * Contract of POST /api/v1/line (shared/api-v1.md): fields, defaults, statuses, regimes, the
 * engine wiring, and outside checks (Hagen–Poiseuille closed form; a fluids/scipy fixture).
 */
import { beforeAll, describe, expect, test } from 'vitest';
import { solveLine } from '../../src/lib/hydraulics';
import { G } from '../../src/lib/hydraulics/constants';
import { lineResultSchema } from '../../src/lib/api/schemas-responses';
import { POST } from '../../src/pages/api/v1/line';
import fixture from '../fixtures/gravity-lines.json';
import { postJson } from './call-route';
import { lineRequest, withField } from './samples';

beforeAll(() => {
  process.env.CALC_RATE_LIMIT_PER_MINUTE = '0';
});

const call = (body: unknown): ReturnType<typeof postJson> => postJson(POST, '/api/v1/line', body);

describe('POST /api/v1/line', () => {
  test('answers 200 with exactly the spec’s fields', async () => {
    const { status, json } = await call(lineRequest);
    expect(status).toBe(200);
    expect(() => lineResultSchema.parse(json)).not.toThrow();
  });

  test('returns the engine’s result for the same input (wiring check)', async () => {
    expect((await call(lineRequest)).json).toEqual(solveLine(structuredClone(lineRequest)));
  });

  test('applies the spec defaults: entrance_k 0.5, minor_loss_k 0, parallel_lines 1, water at 15 °C, altitude 0 m', async () => {
    const explicit = {
      ...lineRequest,
      fluid: { water_temperature_c: 15 },
      site: { altitude_m: 0 },
      line: { ...lineRequest.line, minor_loss_k: 0, entrance_k: 0.5, parallel_lines: 1 },
    };
    const implicit = withField(lineRequest, 'line.minor_loss_k', undefined);
    expect((await call(implicit)).json).toEqual((await call(explicit)).json);
  });

  test('reports losses that add up to head_m (1e-9 relative)', async () => {
    const { json } = await call(lineRequest);
    const l = json.losses_m as Record<string, number>;
    const sum = l.entrance + l.fittings + l.friction + l.exit;
    expect(Math.abs(sum - (json.head_m as number)) / (json.head_m as number)).toBeLessThan(1e-9);
  });

  test('answers no_flow with zero flow fields when H ≤ 0, and counts a tailwater above the outlet', async () => {
    const { json } = await call({ ...lineRequest, tailwater_level_m: 3.5 });
    expect(json).toMatchObject({ status: 'no_flow', flow_m3_s: 0, velocity_m_s: 0, reynolds: 0 });
    expect(json.head_m).toBeCloseTo(3.2 - 3.5, 12);
    expect((json.warnings as { code: string }[]).map((w) => w.code)).toContain('no_head');
    const below = await call({ ...lineRequest, tailwater_level_m: -1 });
    expect(below.json.head_m).toBe(3.2);
  });

  test('adds catalogue fittings to minor_loss_k and multiplies flow by parallel_lines', async () => {
    const byK = await call(withField(lineRequest, 'line.minor_loss_k', 0.6 + 2 * 0.57));
    const byFitting = await call(
      withField(lineRequest, 'line.fittings', [{ id: 'elbow-90-standard', count: 2 }]),
    );
    // elbow-90-standard is K = 30·f_T = 0.57 at 2 in (catalogue, Crane TP-410 style).
    expect(byFitting.json.flow_m3_s).toBeCloseTo(byK.json.flow_m3_s as number, 12);
    const three = await call(withField(lineRequest, 'line.parallel_lines', 3));
    const one = await call(lineRequest);
    expect(three.json.flow_m3_s).toBeCloseTo(3 * (one.json.flow_m3_s as number), 12);
  });

  test('reports the laminar, transitional and turbulent regimes', async () => {
    const liquid = (mu: number): unknown => ({
      ...lineRequest,
      fluid: { density_kg_m3: 1000, viscosity_pa_s: mu, vapor_pressure_pa: 2000 },
      line: { inner_diameter_m: 0.02, length_m: 10, roughness_m: 0 },
      source_level_m: 0.05,
    });
    expect((await call(liquid(0.5))).json.regime).toBe('laminar');
    expect((await call(liquid(1e-3))).json.regime).toBe('turbulent');
    const mid = await call({ ...(liquid(0.005) as object), source_level_m: 0.3 });
    expect((mid.json.reynolds as number) > 2000 && (mid.json.reynolds as number) < 4000).toBe(true);
    expect(mid.json.regime).toBe('transitional');
  });

  test('matches Hagen–Poiseuille with the energy equation for a laminar line (closed form, 1e-6)', async () => {
    // (1 + Ke)·V²/2g + 32·μ·L·V/(ρ·g·D²) = H: f = 64/Re makes friction head linear in V.
    const rho = 1000,
      mu = 0.5,
      d = 0.02,
      l = 10,
      h = 1,
      ke = 0.5;
    const a = (1 + ke) / (2 * G);
    const b = (32 * mu * l) / (rho * G * d * d);
    const v = (-b + Math.sqrt(b * b + 4 * a * h)) / (2 * a);
    const { json } = await call({
      fluid: { density_kg_m3: rho, viscosity_pa_s: mu, vapor_pressure_pa: 2000 },
      line: { inner_diameter_m: d, length_m: l, roughness_m: 0 },
      source_level_m: h,
      outlet_elevation_m: 0,
    });
    expect(json.regime).toBe('laminar');
    expect(Math.abs((json.velocity_m_s as number) - v) / v).toBeLessThan(1e-6);
  });

  test('agrees with the fluids/scipy reference flows (tests/fixtures/gravity-lines.json, 1e-6)', async () => {
    for (const c of fixture.cases) {
      const { json } = await call(c.request);
      const want = c.expected.flow_m3_s;
      expect(Math.abs((json.flow_m3_s as number) - want) / want, c.name).toBeLessThan(1e-6);
    }
  });
});
