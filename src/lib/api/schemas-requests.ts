/**
 * Request schemas of POST /api/v1/line and /api/v1/siphon, and the query of GET /api/v1/water.
 */
import { z } from 'zod';
import { WATER_T_MAX_C, WATER_T_MIN_C } from '../hydraulics/water';
import {
  elevation,
  fluidSchema,
  level,
  lineSchema,
  lossK,
  SITE_ALTITUDE_MAX_M,
  SITE_ALTITUDE_MIN_M,
  siteSchema,
} from './schemas-common';
import { PRESSURE_MAX_PA } from './schema-bounds';
import { component, described } from './schema-registry';

const lineFields = {
  fluid: fluidSchema.optional(),
  site: siteSchema.optional(),
  line: lineSchema,
  source_level_m: elevation('Level of the source’s free surface'),
  outlet_elevation_m: elevation('Elevation of the outlet'),
  tailwater_level_m: described(
    level().optional(),
    'Level of standing water over the outlet, m above your datum; counts when above the outlet',
  ),
};

/** The crest fields a siphon shares with a drain's siphon outlet. */
export const crestFields = {
  crest_elevation_m: elevation('Elevation of the highest point of the line'),
  length_to_crest_m: described(
    z.number().min(0),
    'Length of line from the intake to the crest, m; at most line.length_m',
  ),
  minor_loss_k_to_crest: described(
    lossK().default(0),
    'Fittings K between intake and crest; at most the line’s total fittings K',
  ),
  min_crest_pressure_pa: described(
    z.number().min(0).max(PRESSURE_MAX_PA).optional(),
    'Lowest absolute crest pressure accepted, Pa. Default: vapour pressure plus 20 % of the ' +
      'margin to atmospheric (common practice, allows for air coming out of solution).',
  ),
};

export const lineRequestSchema = component(
  z.strictObject(lineFields),
  'LineRequest',
  'A gravity line from a free surface to an outlet.',
);

export const siphonRequestSchema = component(
  z.strictObject({ ...lineFields, ...crestFields }),
  'SiphonRequest',
  'A siphon: a gravity line whose crest may rise above the source surface.',
);

/** GET /api/v1/water query; values arrive as strings and are turned into numbers first. */
export const waterQuerySchema = z.strictObject({
  temperature_c: described(
    z.number().min(WATER_T_MIN_C).max(WATER_T_MAX_C).default(15),
    'Water temperature, °C',
  ),
  altitude_m: described(
    z.number().min(SITE_ALTITUDE_MIN_M).max(SITE_ALTITUDE_MAX_M).default(0),
    'Altitude above mean sea level, m (US Standard Atmosphere 1976)',
  ),
});

export type LineRequestInput = z.infer<typeof lineRequestSchema>;
export type SiphonRequestInput = z.infer<typeof siphonRequestSchema>;
