/**
 * The schema's bounds (src/lib/api/schema-bounds.ts) against the engine: every corner of them
 * (smallest and largest liquid, bore, length, K, level, vessel and outlet together) computes to a
 * 200 whose numbers are all finite. A bound loose enough for the engine's floating point to
 * overflow or underflow makes this fail with the "no finite result" 400.
 */
import { describe, expect, test } from 'vitest';
import type { ApiAnswer, ApiOperation } from '../../src/lib/api/answer';
import * as b from '../../src/lib/api/schema-bounds';
import { drainOperation, lineOperation, siphonOperation } from '../../src/lib/api/v1-operations';

process.env.CALC_RATE_LIMIT_PER_MINUTE = '0';

function call(operation: ApiOperation, body: unknown): ApiAnswer {
  const bytes = new TextEncoder().encode(JSON.stringify(body));
  return operation({
    method: 'POST',
    url: new URL('http://127.0.0.1/api/v1/corner'),
    header: (name) => (name === 'content-type' ? 'application/json' : null),
    readBody: () => ({ ok: true, bytes }),
    clientAddress: '192.0.2.30',
    requestId: 'bounds-test',
  }) as ApiAnswer;
}

function allNumbersFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (value !== null && typeof value === 'object')
    return Object.values(value).every(allNumbersFinite);
  return true;
}

function expectComputed(operation: ApiOperation, body: unknown): void {
  const answer = call(operation, body);
  expect(answer.status, JSON.stringify({ body, answer: answer.body })).toBe(200);
  expect(allNumbersFinite(answer.body)).toBe(true);
}

const tiny = 1e-300; // vapour pressure has no lower bound but > 0
const fluids = [
  {
    density_kg_m3: b.DENSITY_MIN_KG_M3,
    viscosity_pa_s: b.VISCOSITY_MAX_PA_S,
    vapor_pressure_pa: b.PRESSURE_MAX_PA,
  },
  {
    density_kg_m3: b.DENSITY_MAX_KG_M3,
    viscosity_pa_s: b.VISCOSITY_MIN_PA_S,
    vapor_pressure_pa: tiny,
  },
  {
    density_kg_m3: b.DENSITY_MIN_KG_M3,
    viscosity_pa_s: b.VISCOSITY_MIN_PA_S,
    vapor_pressure_pa: tiny,
  },
  {
    density_kg_m3: b.DENSITY_MAX_KG_M3,
    viscosity_pa_s: b.VISCOSITY_MAX_PA_S,
    vapor_pressure_pa: b.PRESSURE_MAX_PA,
  },
];
const fine = {
  inner_diameter_m: b.BORE_MIN_M,
  length_m: 100_000,
  roughness_m: 0,
  minor_loss_k: b.K_MAX,
  entrance_k: b.K_MAX,
};
const lines = [
  fine,
  { inner_diameter_m: 5, length_m: 0, roughness_m: 0, entrance_k: 0 },
  { inner_diameter_m: b.BORE_MIN_M, length_m: 0, roughness_m: 0, entrance_k: 0 },
  {
    inner_diameter_m: 5,
    length_m: 100_000,
    roughness_m: 4.99,
    minor_loss_k: b.K_MAX,
    parallel_lines: 50,
  },
];
const L = b.LEVEL_MAX_ABS_M;
const levels = [
  [L, -L],
  [1e-9, 0],
  [L, L - 1e-6],
  [-L + 1, -L],
];

describe('corners of the schema bounds', () => {
  test('do compute every gravity line and siphon to finite numbers', () => {
    for (const fluid of fluids)
      for (const line of lines)
        for (const [source, outlet] of levels) {
          const base = { fluid, line, source_level_m: source, outlet_elevation_m: outlet };
          expectComputed(lineOperation, base);
          expectComputed(siphonOperation, {
            ...base,
            crest_elevation_m: L,
            length_to_crest_m: line.length_m,
            min_crest_pressure_pa: b.PRESSURE_MAX_PA,
          });
          expectComputed(siphonOperation, { ...base, crest_elevation_m: -L, length_to_crest_m: 0 });
        }
  });

  test('do compute every drain to finite numbers', () => {
    const S = b.SIZE_MAX_M;
    const vessels: [Record<string, unknown>, number][] = [
      [{ shape: 'box', length_m: S, width_m: S, depth_m: S }, S],
      [
        { shape: 'box', length_m: b.SIZE_MIN_M, width_m: b.SIZE_MIN_M, depth_m: b.SIZE_MIN_M },
        b.SIZE_MIN_M,
      ],
      [
        {
          shape: 'sloped_pond',
          bottom_length_m: S,
          bottom_width_m: S,
          side_slope_h_per_v: b.SIDE_SLOPE_MAX,
          depth_m: S,
        },
        S,
      ],
      [
        {
          shape: 'stage_table',
          points: [
            { depth_m: 0, area_m2: b.AREA_MAX_M2 },
            { depth_m: S, area_m2: b.AREA_MAX_M2 },
          ],
        },
        S,
      ],
    ];
    for (const fluid of fluids)
      for (const [vessel, depth] of vessels) {
        const outlets = [
          { type: 'orifice', diameter_m: b.SIZE_MIN_M, discharge_coefficient: b.CD_MIN },
          { type: 'orifice', diameter_m: S, count: b.COUNT_MAX },
          { type: 'line', line: fine, outlet_elevation_m: -L },
          { type: 'line', line: fine, outlet_elevation_m: 0 },
          {
            type: 'siphon',
            line: fine,
            intake_elevation_m: 0,
            crest_elevation_m: depth,
            length_to_crest_m: 100_000,
            outlet_elevation_m: -L,
            min_crest_pressure_pa: 0,
          },
        ];
        for (const outlet of outlets)
          for (const initial of [depth, 1e-9 * depth])
            expectComputed(drainOperation, {
              fluid,
              vessel,
              initial_depth_m: initial,
              outlet,
              curve_points: 2000,
            });
      }
  });
});
