/**
 * GET /api/v1/water, /api/v1/catalog and /api/v1/openapi.json: shapes, outside values and the
 * OpenAPI document generated from the request schemas.
 */
import { beforeAll, describe, expect, test } from 'vitest';
import { fittings, materials, sizes } from '../../src/lib/hydraulics/catalog';
import { catalogResultSchema, waterResultSchema } from '../../src/lib/api/schemas-responses';
import { GET as catalog } from '../../src/pages/api/v1/catalog';
import { GET as openapi } from '../../src/pages/api/v1/openapi.json';
import { GET as water } from '../../src/pages/api/v1/water';
import atmosphere from '../fixtures/atmosphere-1976.json';
import { callRoute } from './call-route';

beforeAll(() => {
  process.env.CALC_RATE_LIMIT_PER_MINUTE = '0';
});

async function getJson(
  route: typeof water,
  path: string,
  query = '',
): Promise<{ status: number; json: Record<string, unknown> }> {
  const res = await callRoute(route, path, { method: 'GET', query });
  return { status: res.status, json: (await res.json()) as Record<string, unknown> };
}

describe('GET /api/v1/water', () => {
  test('answers the spec’s fields with a source for each', async () => {
    const { status, json } = await getJson(
      water,
      '/api/v1/water',
      '?temperature_c=20&altitude_m=100',
    );
    expect(status).toBe(200);
    expect(() => waterResultSchema.parse(json)).not.toThrow();
  });

  test('gives the IF97 verification value of the saturation pressure at 300 K (IAPWS R7-97 Table 35, 1e-8)', async () => {
    // Table 35 of the release: T = 300 K, p_s = 0.353658941e-2 MPa.
    const { json } = await getJson(water, '/api/v1/water', '?temperature_c=26.85');
    expect(Math.abs((json.vapor_pressure_pa as number) - 3536.58941) / 3536.58941).toBeLessThan(
      1e-8,
    );
  });

  test('gives about 3169.9 Pa at 25 °C (IAPWS-95 saturation tables; IF97 agrees within 0.01 %)', async () => {
    const { json } = await getJson(water, '/api/v1/water', '?temperature_c=25');
    expect(Math.abs((json.vapor_pressure_pa as number) - 3169.9) / 3169.9).toBeLessThan(1e-4);
  });

  test('gives US Standard Atmosphere 1976 pressure at 1000 m (fluids ATMOSPHERE_1976 fixture, 1e-9)', async () => {
    const want = atmosphere.cases.find((c) => c.altitude_m === 1000)!.pressure_pa;
    const { json } = await getJson(water, '/api/v1/water', '?altitude_m=1000');
    expect(Math.abs((json.atmospheric_pressure_pa as number) - want) / want).toBeLessThan(1e-9);
  });

  test('defaults to 15 °C and 0 m (101 325 Pa, exact by definition of the standard)', async () => {
    const a = await getJson(water, '/api/v1/water');
    const b = await getJson(water, '/api/v1/water', '?temperature_c=15&altitude_m=0');
    expect(a.json).toEqual(b.json);
    expect(a.json.atmospheric_pressure_pa).toBe(101_325);
  });

  test('rejects out-of-range, non-numeric, repeated and unknown parameters at their names', async () => {
    const cases: [string, string][] = [
      ['?temperature_c=0', 'temperature_c'],
      ['?temperature_c=100', 'temperature_c'],
      ['?temperature_c=warm', 'temperature_c'],
      ['?temperature_c=', 'temperature_c'],
      ['?altitude_m=-600', 'altitude_m'],
      ['?altitude_m=7000', 'altitude_m'],
      ['?altitude_m=Infinity', 'altitude_m'],
      ['?altitude_m=1&altitude_m=2', 'altitude_m'],
      ['?pressure=1', 'pressure'],
    ];
    for (const [query, path] of cases) {
      const { status, json } = await getJson(water, '/api/v1/water', query);
      expect(status, query).toBe(400);
      expect(
        (json.issues as { path: string }[]).map((i) => i.path),
        query,
      ).toContain(path);
    }
  });
});

describe('GET /api/v1/catalog', () => {
  test('lists every catalogue entry with exactly the spec’s fields', async () => {
    const { status, json } = await getJson(catalog, '/api/v1/catalog');
    expect(status).toBe(200);
    const body = catalogResultSchema.parse(json);
    expect(body.materials.map((m) => m.id)).toEqual(materials.map((m) => m.id));
    expect(body.fittings.map((f) => f.k)).toEqual(fittings.map((f) => f.k));
    expect(body.sizes.map((s) => s.inner_diameter_m)).toEqual(sizes.map((s) => s.inner_diameter_m));
  });
});

describe('GET /api/v1/openapi.json', () => {
  test('is an OpenAPI 3.1 document with every route and the schemas’ ranges', async () => {
    const { status, json } = await getJson(openapi, '/api/v1/openapi.json');
    expect(status).toBe(200);
    expect(json.openapi).toBe('3.1.0');
    expect(Object.keys(json.paths as object).sort()).toEqual([
      '/api/v1/catalog',
      '/api/v1/drain',
      '/api/v1/line',
      '/api/v1/openapi.json',
      '/api/v1/siphon',
      '/api/v1/water',
    ]);
    const schemas = (json.components as { schemas: Record<string, Record<string, any>> }).schemas;
    const line = schemas.Line;
    expect(line.additionalProperties).toBe(false);
    // 0.1 mm: the physical bound of schema-bounds.ts; 5 m the spec's.
    expect(line.properties.inner_diameter_m).toMatchObject({ minimum: 0.0001, maximum: 5 });
    expect(schemas.LineRequest.properties.source_level_m).toMatchObject({
      minimum: -20_000,
      maximum: 20_000,
    });
    // No 422 anywhere: the spec allows 400, 405, 413, 415 and 429 only.
    for (const path of Object.values(json.paths as Record<string, Record<string, any>>))
      for (const op of Object.values(path)) expect(Object.keys(op.responses)).not.toContain('422');
    expect(line.properties.length_m).toMatchObject({ minimum: 0, maximum: 100_000 });
    expect(line.properties.parallel_lines).toMatchObject({
      type: 'integer',
      minimum: 1,
      maximum: 50,
      default: 1,
    });
    expect(line.properties.entrance_k.default).toBe(0.5);
    expect(schemas.DrainRequest.properties.curve_points).toMatchObject({
      minimum: 2,
      maximum: 2000,
      default: 100,
    });
    expect(schemas.Vessel.oneOf).toHaveLength(7);
    expect(schemas.Outlet.oneOf).toHaveLength(3);
    expect(schemas.Fluid.anyOf).toHaveLength(2);
    expect(JSON.stringify(json)).not.toContain('"$schema"');
    const post = (json.paths as Record<string, any>)['/api/v1/siphon'].post;
    expect(Object.keys(post.responses)).toEqual(
      expect.arrayContaining(['200', '400', '405', '413', '415', '429']),
    );
  });
});
