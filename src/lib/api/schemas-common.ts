/**
 * Shared request objects of API v1: fluid, site and line. Ranges are the spec's, tightened to
 * physically sensible bounds (schema-bounds.ts, each with its reason) so that every accepted input
 * computes to finite numbers; zod 4 numbers are finite, so NaN and ±Infinity (JSON's 1e999) are
 * rejected. Cross-field rules that need the
 * catalogue or another field (roughness below the diameter, one of roughness or material) are
 * the engine's, which reports them with their path as well.
 */
import { z } from 'zod';
import { fittings, materials } from '../hydraulics/catalog';
import { WATER_T_MAX_C, WATER_T_MIN_C } from '../hydraulics/water';
import {
  BORE_MIN_M,
  COUNT_MAX,
  DENSITY_MAX_KG_M3,
  DENSITY_MIN_KG_M3,
  K_MAX,
  LEVEL_MAX_ABS_M,
  PRESSURE_MAX_PA,
  VISCOSITY_MAX_PA_S,
  VISCOSITY_MIN_PA_S,
} from './schema-bounds';
import { component, described } from './schema-registry';

/** An elevation or level: any number within ±LEVEL_MAX_ABS_M of the caller's datum. */
export const level = (): z.ZodNumber => z.number().min(-LEVEL_MAX_ABS_M).max(LEVEL_MAX_ABS_M);

/** Elevation or level above the caller's datum, m. */
export const elevation = (what: string): z.ZodNumber =>
  described(level(), `${what}, m above your datum`);

/** A loss coefficient K: 0 up to K_MAX. */
export const lossK = (): z.ZodNumber => z.number().min(0).max(K_MAX);

export const waterSchema = z.strictObject({
  water_temperature_c: described(
    z.number().min(WATER_T_MIN_C).max(WATER_T_MAX_C),
    'Water temperature, °C (IAPWS-IF97 density and vapour pressure, IAPWS 2008 viscosity)',
  ),
});

export const liquidSchema = z.strictObject({
  density_kg_m3: described(
    z.number().min(DENSITY_MIN_KG_M3).max(DENSITY_MAX_KG_M3),
    'Density, kg/m³',
  ),
  viscosity_pa_s: described(
    z.number().min(VISCOSITY_MIN_PA_S).max(VISCOSITY_MAX_PA_S),
    'Dynamic viscosity, Pa·s',
  ),
  vapor_pressure_pa: described(
    z.number().gt(0).max(PRESSURE_MAX_PA),
    'Vapour pressure (absolute), Pa',
  ),
});

export const fluidSchema = component(
  z.union([waterSchema, liquidSchema]),
  'Fluid',
  'Water at a temperature, or any Newtonian liquid by its properties. Default: water at 15 °C.',
);

export const SITE_ALTITUDE_MIN_M = -500;
export const SITE_ALTITUDE_MAX_M = 6000;

export const siteSchema = component(
  z.union([
    z.strictObject({
      altitude_m: described(
        z.number().min(SITE_ALTITUDE_MIN_M).max(SITE_ALTITUDE_MAX_M),
        'Altitude above mean sea level, m (US Standard Atmosphere 1976)',
      ),
    }),
    z.strictObject({
      atmospheric_pressure_pa: described(
        z.number().min(30_000).max(110_000),
        'Barometer reading (absolute, not reduced to sea level), Pa',
      ),
    }),
  ]),
  'Site',
  'Altitude or a barometer reading. Default: altitude 0 m (101 325 Pa).',
);

const materialIds = materials.map((m) => m.id) as [string, ...string[]];
const fittingIds = fittings.filter((f) => f.kind === 'fitting').map((f) => f.id) as [
  string,
  ...string[],
];

export const fittingCountSchema = component(
  z.strictObject({
    id: described(z.enum(fittingIds), 'Catalogue id of a fitting (GET /api/v1/catalog)'),
    count: described(z.int().min(1).max(COUNT_MAX), 'How many of this fitting, integer ≥ 1'),
  }),
  'FittingCount',
  'A catalogue fitting and how many of it; their K is added to minor_loss_k.',
);

export const lineSchema = component(
  z.strictObject({
    inner_diameter_m: described(z.number().min(BORE_MIN_M).max(5), 'Inside diameter, m'),
    length_m: described(z.number().min(0).max(100_000), 'Length along the line, m'),
    roughness_m: described(
      z.number().min(0).optional(),
      'Absolute roughness, m; below the inner diameter. Give this or material.',
    ),
    material: described(
      z.enum(materialIds).optional(),
      'Catalogue material id, for its roughness. Give this or roughness_m.',
    ),
    minor_loss_k: described(
      lossK().default(0),
      'Sum of the fittings’ K along the line, entrance and exit excluded',
    ),
    fittings: described(
      z.array(fittingCountSchema).optional(),
      'Catalogue fittings; their K is added to minor_loss_k',
    ),
    entrance_k: described(lossK().default(0.5), 'Entrance K (0.5: sharp-edged inlet)'),
    parallel_lines: described(z.int().min(1).max(50).default(1), 'Identical lines side by side'),
  }),
  'Line',
  'A hose or pipe run of one inside diameter.',
);
