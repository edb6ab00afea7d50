/**
 * Turning the optional `fluid` and `site` inputs into numbers, with API v1 defaults and ranges.
 */
import type { FluidInput, FluidProps, SiteInput } from './types';
import { EngineInputError } from './types';
import { standardAtmospherePressure } from './atmosphere';
import { WATER_T_MAX_C, WATER_T_MIN_C, waterProperties } from './water';

/** API v1 default liquid: water at 15 °C. */
export const DEFAULT_WATER_TEMPERATURE_C = 15;

const isNum = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function positive(obj: Record<string, unknown>, key: string, path: string): number {
  const v = obj[key];
  if (!isNum(v) || v <= 0) throw new EngineInputError(`${path}.${key}`, 'must be a number > 0');
  return v;
}

/**
 * Liquid properties for a request's `fluid` (default water at 15 °C).
 * Water: 0.01–99 °C via {@link waterProperties}; custom liquid: density, viscosity and vapour
 * pressure all > 0, used as given.
 * @throws EngineInputError for an out-of-range or malformed value.
 */
export function resolveFluid(fluid?: FluidInput, path = 'fluid'): FluidProps {
  if (fluid === undefined) return waterProperties(DEFAULT_WATER_TEMPERATURE_C);
  const obj = fluid as unknown as Record<string, unknown>;
  if ('water_temperature_c' in obj) {
    if ('density_kg_m3' in obj || 'viscosity_pa_s' in obj || 'vapor_pressure_pa' in obj) {
      throw new EngineInputError(path, 'give either a water temperature or liquid properties');
    }
    const t = obj.water_temperature_c;
    if (!isNum(t) || t < WATER_T_MIN_C || t > WATER_T_MAX_C) {
      throw new EngineInputError(
        `${path}.water_temperature_c`,
        `must be between ${WATER_T_MIN_C} and ${WATER_T_MAX_C} °C`,
      );
    }
    return waterProperties(t);
  }
  return {
    density_kg_m3: positive(obj, 'density_kg_m3', path),
    viscosity_pa_s: positive(obj, 'viscosity_pa_s', path),
    vapor_pressure_pa: positive(obj, 'vapor_pressure_pa', path),
  };
}

/**
 * Atmospheric pressure at the site, Pa (default altitude 0 m → 101 325 Pa).
 * Altitude −500…6000 m (US Standard Atmosphere 1976, geometric altitude) or a barometer reading
 * of 30 000–110 000 Pa absolute.
 * @throws EngineInputError for an out-of-range or malformed value.
 */
export function resolveAtmosphere(site?: SiteInput, path = 'site'): number {
  if (site === undefined) return standardAtmospherePressure(0);
  const obj = site as unknown as Record<string, unknown>;
  if ('altitude_m' in obj && 'atmospheric_pressure_pa' in obj) {
    throw new EngineInputError(path, 'give either an altitude or a barometer reading');
  }
  if ('altitude_m' in obj) {
    const z = obj.altitude_m;
    if (!isNum(z) || z < -500 || z > 6000) {
      throw new EngineInputError(`${path}.altitude_m`, 'must be between −500 and 6000 m');
    }
    return standardAtmospherePressure(z);
  }
  const p = obj.atmospheric_pressure_pa;
  if (!isNum(p) || p < 30_000 || p > 110_000) {
    throw new EngineInputError(
      `${path}.atmospheric_pressure_pa`,
      'must be between 30 000 and 110 000 Pa',
    );
  }
  return p;
}
