/**
 * Request schema of POST /api/v1/drain: a vessel, one outlet and the levels to drain between.
 * Vessel dimensions are in metres; depths are measured up from the vessel's lowest point.
 */
import { z } from 'zod';
import { elevation, fluidSchema, level, lineSchema, siteSchema } from './schemas-common';
import {
  AREA_MAX_M2,
  CD_MIN,
  COUNT_MAX,
  SIDE_SLOPE_MAX,
  SIZE_MAX_M,
  SIZE_MIN_M,
} from './schema-bounds';
import { crestFields } from './schemas-requests';
import { component, described } from './schema-registry';

const length = (): z.ZodNumber => z.number().min(SIZE_MIN_M).max(SIZE_MAX_M);
const size = (what: string): z.ZodNumber => described(length(), `${what}, m`);
/** A depth above the lowest point: 0 up to the largest vessel size. */
const depth = (): z.ZodNumber => z.number().min(0).max(SIZE_MAX_M);

const stagePointSchema = z.strictObject({
  depth_m: described(depth(), 'Depth above the lowest point, m'),
  area_m2: described(z.number().gt(0).max(AREA_MAX_M2), 'Free-surface area at that depth, m²'),
});

export const vesselSchema = component(
  z.discriminatedUnion('shape', [
    z.strictObject({
      shape: z.literal('box'),
      length_m: size('Inside length'),
      width_m: size('Inside width'),
      depth_m: size('Inside depth'),
    }),
    z.strictObject({
      shape: z.literal('vertical_cylinder'),
      diameter_m: size('Inside diameter'),
      depth_m: size('Inside depth'),
    }),
    z.strictObject({
      shape: z.literal('horizontal_cylinder'),
      diameter_m: size('Inside diameter'),
      length_m: size('Length between the flat ends'),
    }),
    z.strictObject({ shape: z.literal('sphere'), diameter_m: size('Inside diameter') }),
    z.strictObject({
      shape: z.literal('cone_bottom'),
      diameter_m: size('Inside diameter of the cylinder'),
      cone_height_m: size('Height of the cone, apex down'),
      depth_m: size('Total depth, at least the cone height'),
    }),
    z.strictObject({
      shape: z.literal('sloped_pond'),
      bottom_length_m: size('Length of the flat bottom'),
      bottom_width_m: size('Width of the flat bottom'),
      side_slope_h_per_v: described(
        z.number().min(0).max(SIDE_SLOPE_MAX),
        'Side slope, horizontal per vertical',
      ),
      depth_m: size('Depth from the bottom to the top of the banks'),
    }),
    z.strictObject({
      shape: z.literal('stage_table'),
      points: described(
        z.array(stagePointSchema).min(2).max(1000),
        'Depth–area rows, depth strictly increasing from 0; area linear between rows',
      ),
    }),
  ]),
  'Vessel',
  'The vessel, basin or pond being emptied.',
);

const orificeSchema = z.strictObject({
  type: z.literal('orifice'),
  diameter_m: size('Orifice diameter'),
  discharge_coefficient: described(
    z.number().min(CD_MIN).max(1).default(0.61),
    'Cd (0.61: sharp-edged, common practice)',
  ),
  elevation_m: described(
    level().optional(),
    'Elevation of the orifice centre, m above your datum; default the vessel bottom',
  ),
  count: described(z.int().min(1).max(COUNT_MAX).default(1), 'Identical orifices'),
});

const lineOutletSchema = z.strictObject({
  type: z.literal('line'),
  line: lineSchema,
  intake_elevation_m: described(
    level().optional(),
    'Elevation of the intake, m above your datum; default the vessel bottom',
  ),
  outlet_elevation_m: elevation('Elevation of the outlet'),
  tailwater_level_m: described(level().optional(), 'Level of standing water over the outlet, m'),
});

const siphonOutletSchema = z.strictObject({
  type: z.literal('siphon'),
  line: lineSchema,
  intake_elevation_m: elevation('Elevation of the intake'),
  ...crestFields,
  outlet_elevation_m: elevation('Elevation of the outlet'),
  tailwater_level_m: described(level().optional(), 'Level of standing water over the outlet, m'),
});

export const outletSchema = component(
  z.discriminatedUnion('type', [orificeSchema, lineOutletSchema, siphonOutletSchema]),
  'Outlet',
  'How the water leaves: orifices in the wall or floor, a gravity line, or a siphon over the rim.',
);

export const drainRequestSchema = component(
  z.strictObject({
    fluid: fluidSchema.optional(),
    site: siteSchema.optional(),
    vessel: vesselSchema,
    bottom_elevation_m: described(
      level().default(0),
      'Elevation of the vessel’s lowest point, m above your datum',
    ),
    initial_depth_m: described(
      z.number().gt(0).max(SIZE_MAX_M),
      'Starting depth, m; at most the vessel depth',
    ),
    final_depth_m: described(depth().default(0), 'Target depth, m; below the start'),
    outlet: outletSchema,
    curve_points: described(
      z.int().min(2).max(2000).default(100),
      'Rows in the returned curve, first at t = 0, last at the stop',
    ),
  }),
  'DrainRequest',
  'Quasi-steady drain-down of a vessel through one outlet.',
);

export type DrainRequestInput = z.infer<typeof drainRequestSchema>;
