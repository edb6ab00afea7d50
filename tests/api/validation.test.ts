/**
 * Every request field of API v1 against the spec's ranges: each bad value or missing required
 * field answers 400 invalid_input with an issue at exactly that field's dotted path, and a
 * message that names the path. Ranges from shared/api-v1.md.
 */
import type { APIRoute } from 'astro';
import { beforeAll, describe, expect, test } from 'vitest';
import { POST as drain } from '../../src/pages/api/v1/drain';
import { POST as line } from '../../src/pages/api/v1/line';
import { POST as siphon } from '../../src/pages/api/v1/siphon';
import { postJson } from './call-route';
import { drainRequest, lineRequest, siphonRequest, withField } from './samples';

beforeAll(() => {
  process.env.CALC_RATE_LIMIT_PER_MINUTE = '0';
});

type Case = [path: string, value: unknown];

const lineCases: Case[] = [
  ['line', undefined],
  ['line.inner_diameter_m', undefined],
  ['line.inner_diameter_m', 0],
  ['line.inner_diameter_m', 5.01],
  ['line.inner_diameter_m', '0.05'],
  ['line.length_m', -1],
  ['line.length_m', 100_001],
  ['line.roughness_m', -1e-6],
  ['line.material', 'bamboo'],
  ['line.minor_loss_k', -0.1],
  ['line.fittings', [{ id: 'elbow-90-standard', count: 0 }]],
  ['line.fittings', [{ id: 'elbow-90-standard', count: 1.5 }]],
  ['line.fittings', [{ id: 'no-such-fitting', count: 1 }]],
  ['line.fittings', [{ id: 'elbow-90-standard', count: 1, k: 3 }]],
  ['line.entrance_k', -1],
  ['line.parallel_lines', 0],
  ['line.parallel_lines', 51],
  ['line.parallel_lines', 2.5],
  ['line.colour', 'blue'],
  ['source_level_m', undefined],
  ['source_level_m', null],
  ['outlet_elevation_m', undefined],
  ['tailwater_level_m', 'high'],
  ['fluid', 7],
  ['fluid', { water_temperature_c: 0 }],
  ['fluid', { water_temperature_c: 99.5 }],
  ['fluid', { density_kg_m3: 0, viscosity_pa_s: 1e-3, vapor_pressure_pa: 2000 }],
  ['fluid', { density_kg_m3: 1000, viscosity_pa_s: -1, vapor_pressure_pa: 2000 }],
  ['fluid', { density_kg_m3: 1000, viscosity_pa_s: 1e-3, vapor_pressure_pa: 0 }],
  ['fluid', {}],
  ['site', { altitude_m: -501 }],
  ['site', { altitude_m: 6001 }],
  ['site', { atmospheric_pressure_pa: 29_999 }],
  ['site', { atmospheric_pressure_pa: 110_001 }],
  ['site', { altitude_m: 0, atmospheric_pressure_pa: 101_325 }],
  ['extra', true],
];

/** The issue path expected for a case: the field itself, or the deepest field inside it. */
function expectedPath(path: string, value: unknown): string[] {
  if (path === 'line.fittings')
    return ['line.fittings.0.count', 'line.fittings.0.id', 'line.fittings.0.k'];
  if (path === 'fluid' || path === 'site') {
    const keys = value && typeof value === 'object' ? Object.keys(value) : [];
    return [path, ...keys.map((k) => `${path}.${k}`)];
  }
  return [path];
}

async function expectRejected(
  route: APIRoute,
  url: string,
  base: unknown,
  [path, value]: Case,
): Promise<void> {
  const { status, json } = await postJson(route, url, withField(base, path, value));
  expect(status, `${path} = ${JSON.stringify(value)}`).toBe(400);
  expect(json.error).toBe('invalid_input');
  const issues = json.issues as { path: string; message: string }[];
  const wanted = expectedPath(path, value);
  expect(
    issues.some((i) => wanted.includes(i.path)),
    `${path}: ${JSON.stringify(issues)}`,
  ).toBe(true);
  for (const i of issues) expect(i.message.startsWith(i.path)).toBe(true);
}

describe('API v1 input validation', () => {
  test('rejects each bad line-request field at its path', async () => {
    for (const c of lineCases) await expectRejected(line, '/api/v1/line', lineRequest, c);
  });

  test('rejects roughness at or above the inner diameter, and both or neither of roughness and material', async () => {
    const noMaterial = withField(lineRequest, 'line.material', undefined);
    await expectRejected(line, '/api/v1/line', noMaterial, ['line.roughness_m', 0.0508]);
    const neither = await postJson(line, '/api/v1/line', noMaterial);
    expect((neither.json.issues as { path: string }[])[0].path).toBe('line');
    const both = await postJson(
      line,
      '/api/v1/line',
      withField(lineRequest, 'line.roughness_m', 1e-5),
    );
    expect(both.status).toBe(400);
    expect((both.json.issues as { path: string }[])[0].path).toBe('line');
  });

  test('rejects each bad siphon-only field at its path', async () => {
    const cases: Case[] = [
      ['crest_elevation_m', undefined],
      ['length_to_crest_m', undefined],
      ['length_to_crest_m', -1],
      ['minor_loss_k_to_crest', -1],
      ['min_crest_pressure_pa', -1],
      ['min_crest_pressure_pa', 'low'],
    ];
    for (const c of cases) await expectRejected(siphon, '/api/v1/siphon', siphonRequest, c);
  });

  test('rejects each bad drain field at its path', async () => {
    const cases: Case[] = [
      ['vessel', undefined],
      ['vessel.shape', 'cube'],
      ['vessel.length_m', 0],
      ['vessel.width_m', undefined],
      ['vessel.depth_m', -2],
      ['vessel.radius_m', 2],
      ['initial_depth_m', undefined],
      ['initial_depth_m', 0],
      ['initial_depth_m', 2.5],
      ['final_depth_m', -0.1],
      ['final_depth_m', 1.9],
      ['bottom_elevation_m', 'low'],
      ['curve_points', 1],
      ['curve_points', 2001],
      ['curve_points', 10.5],
      ['outlet', undefined],
      ['outlet', [{ type: 'orifice', diameter_m: 0.05 }]],
      ['outlet.type', 'pump'],
      ['outlet.diameter_m', 0],
      ['outlet.discharge_coefficient', 0],
      ['outlet.discharge_coefficient', 1.2],
      ['outlet.count', 0],
      ['outlet.elevation_m', '0'],
    ];
    for (const c of cases) await expectRejected(drain, '/api/v1/drain', drainRequest, c);
  });

  test('rejects bad stage tables, cone and slope dimensions at their paths', async () => {
    const table = (points: unknown): unknown => ({
      ...drainRequest,
      vessel: { shape: 'stage_table', points },
      initial_depth_m: 1,
    });
    const row = (d: number, a: number): unknown => ({ depth_m: d, area_m2: a });
    const bad: [unknown, string][] = [
      [table([row(0, 1)]), 'vessel.points'],
      [table(Array.from({ length: 1001 }, (_, i) => row(i, 1))), 'vessel.points'],
      [table([row(0.5, 1), row(2, 1)]), 'vessel.points.0.depth_m'],
      [table([row(0, 1), row(2, 1), row(2, 1)]), 'vessel.points.2.depth_m'],
      [table([row(0, 1), row(2, 0)]), 'vessel.points.1.area_m2'],
      [
        {
          ...drainRequest,
          vessel: { shape: 'cone_bottom', diameter_m: 2, cone_height_m: 3, depth_m: 2 },
        },
        'vessel.depth_m',
      ],
      [
        {
          ...drainRequest,
          vessel: {
            shape: 'sloped_pond',
            bottom_length_m: 4,
            bottom_width_m: 2,
            side_slope_h_per_v: -1,
            depth_m: 2,
          },
        },
        'vessel.side_slope_h_per_v',
      ],
    ];
    for (const [body, path] of bad) {
      const { status, json } = await postJson(drain, '/api/v1/drain', body);
      expect(status, path).toBe(400);
      expect(
        (json.issues as { path: string }[]).map((i) => i.path),
        path,
      ).toContain(path);
    }
  });

  test('rejects bad line and siphon outlets of a drain at their nested paths', async () => {
    const lineOutlet = {
      type: 'line',
      line: { inner_diameter_m: 0, length_m: 5, material: 'pvc' },
      outlet_elevation_m: -1,
    };
    const a = await postJson(drain, '/api/v1/drain', { ...drainRequest, outlet: lineOutlet });
    expect((a.json.issues as { path: string }[])[0].path).toBe('outlet.line.inner_diameter_m');
    const siphonOutlet = {
      type: 'siphon',
      line: { inner_diameter_m: 0.05, length_m: 5, material: 'pvc' },
      outlet_elevation_m: -1,
      crest_elevation_m: 3,
    };
    const b = await postJson(drain, '/api/v1/drain', { ...drainRequest, outlet: siphonOutlet });
    const paths = (b.json.issues as { path: string }[]).map((i) => i.path);
    expect(paths).toEqual(
      expect.arrayContaining(['outlet.intake_elevation_m', 'outlet.length_to_crest_m']),
    );
  });
});
