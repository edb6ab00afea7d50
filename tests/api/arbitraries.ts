/**
 * fast-check arbitraries for requests inside the spec's field ranges (sizes drawn on log scales
 * so millimetre hoses and metre culverts both come up).
 */
import fc from 'fast-check';

const logRange = (lo: number, hi: number): fc.Arbitrary<number> =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map(Math.exp);

const fluid = fc.option(
  fc.oneof(
    fc.record({ water_temperature_c: fc.double({ min: 0.01, max: 99, noNaN: true }) }),
    fc.record({
      density_kg_m3: logRange(500, 2000),
      viscosity_pa_s: logRange(1e-4, 10),
      vapor_pressure_pa: logRange(1, 50_000),
    }),
  ),
  { nil: undefined },
);

const site = fc.option(
  fc.oneof(
    fc.record({ altitude_m: fc.double({ min: -500, max: 6000, noNaN: true }) }),
    fc.record({ atmospheric_pressure_pa: fc.double({ min: 30_000, max: 110_000, noNaN: true }) }),
  ),
  { nil: undefined },
);

const lineArbInner = fc.record({
  inner_diameter_m: logRange(1e-4, 5),
  length_m: fc.oneof(fc.constant(0), logRange(0.01, 100_000)),
  material: fc.constantFrom('pvc', 'hdpe', 'garden-hose', 'layflat-hose', 'concrete-rough'),
  minor_loss_k: fc.option(logRange(0.01, 1000), { nil: undefined }),
  fittings: fc.option(
    fc.array(
      fc.record({
        id: fc.constantFrom('elbow-90-standard', 'valve-gate'),
        count: fc.integer({ min: 1, max: 20 }),
      }),
      { maxLength: 3 },
    ),
    { nil: undefined },
  ),
  entrance_k: fc.option(fc.double({ min: 0, max: 5, noNaN: true }), { nil: undefined }),
  parallel_lines: fc.option(fc.integer({ min: 1, max: 50 }), { nil: undefined }),
});

// Sub-nanometre differences of level are noise; rounding them to 0 keeps heads physical.
const level = fc
  .double({ min: -200, max: 200, noNaN: true })
  .map((x) => (Math.abs(x) < 1e-9 ? 0 : x));

export const lineArb = fc.record({
  fluid,
  site,
  line: lineArbInner,
  source_level_m: level,
  outlet_elevation_m: level,
  tailwater_level_m: fc.option(level, { nil: undefined }),
});

export const siphonArb = fc
  .tuple(
    lineArb,
    level,
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.option(logRange(1, 100_000), { nil: undefined }),
  )
  .map(([req, crest, share, limit]) => ({
    ...req,
    crest_elevation_m: crest,
    length_to_crest_m: req.line.length_m * share,
    min_crest_pressure_pa: limit,
  }));

const vessel = fc.oneof(
  fc.record({
    shape: fc.constant('box'),
    length_m: logRange(0.1, 1000),
    width_m: logRange(0.1, 1000),
    depth_m: logRange(0.1, 20),
  }),
  fc.record({ shape: fc.constant('sphere'), diameter_m: logRange(0.1, 50) }),
  fc.record({
    shape: fc.constant('horizontal_cylinder'),
    diameter_m: logRange(0.1, 10),
    length_m: logRange(0.1, 50),
  }),
  fc.array(logRange(0.01, 1e5), { minLength: 2, maxLength: 300 }).map((areas) => ({
    shape: 'stage_table',
    points: areas.map((a, i) => ({ depth_m: i * 0.05, area_m2: a })),
  })),
);

const depthOf = (v: Record<string, unknown>): number =>
  v.shape === 'stage_table'
    ? (v.points as { depth_m: number }[]).at(-1)!.depth_m
    : ((v.depth_m ?? v.diameter_m) as number);

export const drainArb = fc
  .tuple(
    fluid,
    vessel,
    fc.double({ min: 0.05, max: 1, noNaN: true }),
    fc.nat(2),
    lineArbInner,
    fc.double({ min: 0, max: 1, noNaN: true }),
  )
  .map(([fl, v, share, kind, ln, u]) => {
    const d = depthOf(v as Record<string, unknown>);
    const outlet =
      kind === 0
        ? { type: 'orifice', diameter_m: 0.001 + u * 0.3, elevation_m: u * d * 0.3 }
        : kind === 1
          ? { type: 'line', line: ln, outlet_elevation_m: -u * 20 }
          : {
              type: 'siphon',
              line: ln,
              intake_elevation_m: u * d * 0.2,
              crest_elevation_m: d + u * 8,
              length_to_crest_m: ln.length_m * u,
              outlet_elevation_m: -1 - u * 10,
            };
    return { fluid: fl, vessel: v, initial_depth_m: d * share, outlet, curve_points: 20 };
  });
