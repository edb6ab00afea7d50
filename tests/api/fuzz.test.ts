/**
 * Property tests (fast-check): random JSON, mutated valid requests and random in-range requests
 * thrown at each endpoint. Never a 5xx; errors always a 400 in the spec's shape (no 422: the spec
 * has none); and no input the schema accepts reaches the engine's "no finite result" answer, so
 * an engine failure, or a schema bound too loose for the engine, makes this test fail.
 */
import fc from 'fast-check';
import type { APIRoute } from 'astro';
import { beforeAll, describe, expect, test } from 'vitest';
import {
  drainResultSchema,
  errorSchema,
  lineResultSchema,
  siphonResultSchema,
} from '../../src/lib/api/schemas-responses';
import { POST as drain } from '../../src/pages/api/v1/drain';
import { POST as line } from '../../src/pages/api/v1/line';
import { POST as siphon } from '../../src/pages/api/v1/siphon';
import { GET as water } from '../../src/pages/api/v1/water';
import { callRoute } from './call-route';
import { drainRequest, lineRequest, siphonRequest, withField } from './samples';
import { drainArb, lineArb, siphonArb } from './arbitraries';

beforeAll(() => {
  process.env.CALC_RATE_LIMIT_PER_MINUTE = '0';
});

const endpoints: [
  string,
  APIRoute,
  object,
  typeof lineResultSchema | typeof siphonResultSchema | typeof drainResultSchema,
][] = [
  ['line', line, lineRequest, lineResultSchema],
  ['siphon', siphon, siphonRequest, siphonResultSchema],
  ['drain', drain, drainRequest, drainResultSchema],
];

/** The issue of the 400 for inputs the schema accepted but the engine could not compute. */
const NO_FINITE = /no finite result/;

/**
 * Status and body checks every answer must pass; returns the status. `tinyLevel`: a level a
 * few hundred orders of magnitude below a millimetre (5e-324) makes a head the engine's floating
 * point underflows on; no bound can refuse it (a level may be any number near 0), so there, and
 * only there, the "no finite result" 400 is the expected answer.
 */
async function checkAnswer(
  res: Response,
  result: { parse: (v: unknown) => unknown },
  tinyLevel = false,
): Promise<number> {
  expect(res.status).toBeLessThan(500);
  const json = await res.json();
  if (res.status === 200) result.parse(json);
  else {
    const err = errorSchema.parse(json);
    expect(res.status).toBe(400);
    expect(err.error).toBe('invalid_input');
    if (!tinyLevel) for (const i of err.issues) expect(i.message).not.toMatch(NO_FINITE);
    for (const i of err.issues)
      expect(i.message.toLowerCase().startsWith(i.path.toLowerCase())).toBe(true);
  }
  return res.status;
}

/** Dotted paths of every leaf and object in a request. */
function pathsOf(value: unknown, prefix = ''): string[] {
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => {
    const p = prefix ? `${prefix}.${k}` : k;
    return [p, ...(Array.isArray(v) ? [] : pathsOf(v, p))];
  });
}

describe.each(endpoints)('POST /api/v1/%s under random input', (name, route, sample, result) => {
  const url = `/api/v1/${name}`;

  test('answers random JSON documents with 400 in the error shape, never 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(fc.jsonValue(), async (body) => {
        await checkAnswer(await callRoute(route, url, { body }), result);
      }),
      { numRuns: 300 },
    );
  });

  test('answers random bytes as a body with 400, never 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(fc.string({ maxLength: 200 }), async (raw) => {
        await checkAnswer(await callRoute(route, url, { raw }), result);
      }),
      { numRuns: 200 },
    );
  });

  test('answers a valid request with one field replaced by random JSON in the spec’s shapes', async () => {
    const paths = pathsOf(sample);
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...paths), fc.jsonValue(), async (path, value) => {
        const body = withField(sample, path, value);
        const tiny = typeof value === 'number' && value !== 0 && Math.abs(value) < 1e-290;
        await checkAnswer(await callRoute(route, url, { body }), result, tiny);
      }),
      { numRuns: 400 },
    );
  });
});

describe('random in-range requests', () => {
  const cases: [string, APIRoute, fc.Arbitrary<unknown>, { parse: (v: unknown) => unknown }][] = [
    ['line', line, lineArb, lineResultSchema],
    ['siphon', siphon, siphonArb, siphonResultSchema],
    ['drain', drain, drainArb, drainResultSchema],
  ];
  // Magnitudes a site can have (levels ±200 m, bores 0.1 mm–5 m): "no finite result" is a bug.
  test.each(cases)(
    'POST /api/v1/%s computes them (200, or 400 for a cross-field rule), never "no finite result"',
    async (name, route, arb, result) => {
      await fc.assert(
        fc.asyncProperty(arb, async (body) => {
          await checkAnswer(await callRoute(route, `/api/v1/${name}`, { body }), result);
        }),
        { numRuns: name === 'drain' ? 150 : 400 },
      );
    },
  );

  test('GET /api/v1/water answers any query string with 200 or 400', async () => {
    const param = fc.oneof(fc.double(), fc.string({ maxLength: 12 }), fc.integer()).map(String);
    await fc.assert(
      fc.asyncProperty(
        fc.dictionary(fc.constantFrom('temperature_c', 'altitude_m', 'x'), param),
        async (q) => {
          const query = `?${new URLSearchParams(q).toString()}`;
          const res = await callRoute(water, '/api/v1/water', { method: 'GET', query });
          expect([200, 400]).toContain(res.status);
          if (res.status === 400) errorSchema.parse(await res.json());
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('magnitudes beyond floating point', () => {
  // These once answered 422 cannot_compute (velocity underflowed, f = 64/Re became Infinity; a
  // 1e300 m level overflowed): now the schema's bounds refuse them with a 400 naming the field.
  test.each([
    [
      'line',
      line,
      withField(lineRequest, 'line.inner_diameter_m', 1e-300),
      ['line.inner_diameter_m'],
    ],
    [
      'line',
      line,
      {
        fluid: { density_kg_m3: 1e300, viscosity_pa_s: 1e-300, vapor_pressure_pa: 1 },
        line: { inner_diameter_m: 5, length_m: 100000, roughness_m: 0 },
        source_level_m: 1e300,
        outlet_elevation_m: -1e300,
      },
      ['fluid.density_kg_m3', 'fluid.viscosity_pa_s', 'source_level_m', 'outlet_elevation_m'],
    ],
    [
      'drain',
      drain,
      {
        vessel: { shape: 'box', length_m: 1e300, width_m: 1e300, depth_m: 1e300 },
        initial_depth_m: 1e300,
        outlet: { type: 'orifice', diameter_m: 1e-300 },
      },
      [
        'vessel.length_m',
        'vessel.width_m',
        'vessel.depth_m',
        'initial_depth_m',
        'outlet.diameter_m',
      ],
    ],
  ] as const)(
    'answer POST /api/v1/%s with 400 naming each field',
    async (name, route, body, paths) => {
      const res = await callRoute(route, `/api/v1/${name}`, { body });
      expect(res.status).toBe(400);
      const err = errorSchema.parse(await res.json());
      expect(err.error).toBe('invalid_input');
      expect(err.issues.map((i) => i.path).sort()).toEqual([...paths].sort());
    },
  );
});
