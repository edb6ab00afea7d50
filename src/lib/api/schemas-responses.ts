/**
 * Response schemas of API v1. They document the answers in the OpenAPI document, and the
 * contract tests check every real answer against them (strict: no field missing, none extra).
 */
import { z } from 'zod';
import { component, described } from './schema-registry';

const warningSchema = component(
  z.strictObject({ code: z.string(), message: z.string() }),
  'Warning',
  'A caution to show beside the result; code is stable, message is plain words.',
);

const lineResultFields = {
  head_m: described(z.number(), 'Driving head H, m'),
  flow_m3_s: described(z.number(), 'Flow of all lines together, m³/s'),
  velocity_m_s: described(z.number(), 'Mean velocity in one line, m/s'),
  reynolds: z.number(),
  friction_factor: described(z.number(), 'Darcy friction factor f'),
  regime: z.enum(['laminar', 'transitional', 'turbulent']),
  losses_m: described(
    z.strictObject({
      entrance: z.number(),
      fittings: z.number(),
      friction: z.number(),
      exit: z.number(),
    }),
    'Head lost in each part, m; they add up to head_m',
  ),
  warnings: z.array(warningSchema),
  engine_version: z.string(),
};

export const lineResultSchema = component(
  z.strictObject({ status: z.enum(['runs', 'no_flow']), ...lineResultFields }),
  'LineResult',
  'Steady flow of a gravity line. no_flow when H ≤ 0; flow fields are then 0.',
);

export const siphonResultSchema = component(
  z.strictObject({
    status: z.enum(['runs', 'marginal', 'breaks', 'no_flow']),
    ...lineResultFields,
    atmospheric_pressure_pa: z.number(),
    vapor_pressure_pa: z.number(),
    crest_pressure_abs_pa: described(z.number(), 'Absolute pressure at the crest, Pa'),
    crest_limit_pa: described(z.number(), 'The lowest crest pressure accepted, Pa'),
    max_crest_height_m: described(
      z.number(),
      'Crest height above the source surface at which, at this flow, crest pressure would equal vapour pressure, m',
    ),
    priming_volume_m3: described(z.number(), 'Liquid needed to fill every line, m³'),
  }),
  'SiphonResult',
  'runs: crest pressure ≥ limit; marginal: between vapour pressure and the limit; breaks: ' +
    'below vapour pressure (the flow shown is the ideal one); no_flow: H ≤ 0.',
);

export const drainResultSchema = component(
  z.strictObject({
    status: z.enum(['drains', 'stops_early', 'no_flow']),
    stop_reason: z.enum(['final_depth', 'intake_uncovered', 'no_head', 'siphon_breaks']),
    time_s: z.number(),
    stop_depth_m: z.number(),
    volume_initial_m3: z.number(),
    volume_drained_m3: z.number(),
    volume_left_m3: z.number(),
    initial_flow_m3_s: z.number(),
    mean_flow_m3_s: z.number(),
    curve: z.array(
      z.strictObject({
        time_s: z.number(),
        depth_m: z.number(),
        flow_m3_s: z.number(),
        volume_m3: z.number(),
      }),
    ),
    warnings: z.array(warningSchema),
    engine_version: z.string(),
  }),
  'DrainResult',
  'Time to drain and the level–time curve.',
);

export const waterResultSchema = component(
  z.strictObject({
    density_kg_m3: z.number(),
    viscosity_pa_s: z.number(),
    vapor_pressure_pa: z.number(),
    atmospheric_pressure_pa: z.number(),
    sources: z.strictObject({
      density_kg_m3: z.string(),
      viscosity_pa_s: z.string(),
      vapor_pressure_pa: z.string(),
      atmospheric_pressure_pa: z.string(),
    }),
  }),
  'WaterProperties',
  'Water properties at a temperature and atmospheric pressure at an altitude.',
);

const entry = { id: z.string(), name: z.string(), source: z.string() };
export const catalogResultSchema = component(
  z.strictObject({
    materials: z.array(z.strictObject({ ...entry, roughness_m: z.number() })),
    fittings: z.array(z.strictObject({ ...entry, k: z.number() })),
    sizes: z.array(z.strictObject({ ...entry, inner_diameter_m: z.number() })),
  }),
  'Catalog',
  'Materials (roughness), fittings (K) and hose/pipe sizes (inside diameter), with sources.',
);

export const errorSchema = component(
  z.strictObject({
    error: z.enum([
      'invalid_input',
      'not_found',
      'method_not_allowed',
      'payload_too_large',
      'unsupported_media_type',
      'rate_limited',
    ]),
    issues: z.array(
      z.strictObject({
        path: described(z.string(), 'Dotted path of the field ("" for the whole body)'),
        message: z.string(),
      }),
    ),
  }),
  'Error',
  'Every error answer has this shape.',
);

export type ApiErrorCode = z.infer<typeof errorSchema>['error'];
export interface ApiIssue {
  path: string;
  message: string;
}
