/**
 * GET /api/v1/water: the engine's water properties and standard-atmosphere pressure, with the
 * source of each figure; and the query string turned into numbers for the schema.
 */
import { standardAtmospherePressure } from '../hydraulics/atmosphere';
import { waterProperties } from '../hydraulics/water';

export interface WaterAnswer {
  density_kg_m3: number;
  viscosity_pa_s: number;
  vapor_pressure_pa: number;
  atmospheric_pressure_pa: number;
  sources: Record<
    'density_kg_m3' | 'viscosity_pa_s' | 'vapor_pressure_pa' | 'atmospheric_pressure_pa',
    string
  >;
}

const SOURCES: WaterAnswer['sources'] = {
  density_kg_m3: 'IAPWS-IF97 region 1 (IAPWS R7-97(2012), Eq. 7) at 101.325 kPa',
  viscosity_pa_s: 'IAPWS 2008 viscosity formulation (IAPWS R12-08), industrial use, at 101.325 kPa',
  vapor_pressure_pa: 'IAPWS-IF97 saturation-pressure equation (IAPWS R7-97(2012), Eq. 30)',
  atmospheric_pressure_pa: 'US Standard Atmosphere 1976, geometric altitude',
};

/** Water at temperatureC (0.01–99 °C) and air pressure at altitudeM (−500–6000 m). */
export function waterAnswer(temperatureC: number, altitudeM: number): WaterAnswer {
  return {
    ...waterProperties(temperatureC),
    atmospheric_pressure_pa: standardAtmospherePressure(altitudeM),
    sources: SOURCES,
  };
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Query parameters as an object for zod: a plain decimal number becomes a number, anything else
 * stays a string (and fails the schema with its name); a repeated name is reported by itself.
 */
export function queryObject(params: URLSearchParams): {
  value: Record<string, unknown>;
  repeated?: string;
} {
  const value: Record<string, unknown> = {};
  for (const [key, raw] of params) {
    if (key in value) return { value, repeated: key };
    value[key] = NUMBER.test(raw.trim()) ? Number(raw) : raw;
  }
  return { value };
}
