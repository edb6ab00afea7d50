/**
 * Inputs the full tools share — the line (catalogue size or own bore, material, entrance,
 * fittings with counts, parallel lines), the water and the site — and their engine requests.
 * All values SI; the share URL carries them as they are.
 */
import type { FluidInput, LineInput, SiteInput } from '../hydraulics';
import { findSize } from '../hydraulics';
import { engineWaterTemperatureC } from './field-input';
import { degF, ft, inch, psia } from './us-start';

export interface FittingRow {
  [key: string]: string | number;
  id: string;
  count: number;
}

export interface LineFieldsState {
  [key: string]: string | number | boolean | Record<string, string | number>[];
  /** Catalogue size id, or 'custom' for `diameter_m`. */
  size: string;
  diameter_m: number;
  /** Material id, or 'auto' for the size's own. */
  material: string;
  length_m: number;
  /** Entrance fitting id. */
  entrance: string;
  fittings: FittingRow[];
  parallel: number;
  temp_c: number;
  site_mode: 'altitude' | 'barometer';
  altitude_m: number;
  pressure_pa: number;
}

export const LINE_FIELD_DEFAULTS: LineFieldsState = {
  size: 'suction-hose-2in',
  diameter_m: 0.05,
  material: 'auto',
  length_m: 30,
  entrance: 'entrance-hose-end',
  fittings: [],
  parallel: 1,
  temp_c: 15,
  site_mode: 'altitude',
  altitude_m: 0,
  pressure_pa: 101_325,
};

/** A US crew's starting values for the shared fields (us-start.ts). */
export const LINE_FIELD_US_START: Partial<LineFieldsState> = {
  diameter_m: inch(2),
  length_m: ft(100),
  temp_c: degF(60),
  pressure_pa: psia(14.7),
};

/** Template for decoding fitting rows from a link. */
export const FITTING_ROW: FittingRow = { id: '', count: 1 };

/** Entrance K values from the catalogue, by fitting id (sharp edge 0.5 when unknown). */
export function lineInput(s: LineFieldsState, entranceK: (id: string) => number): LineInput {
  const size = s.size === 'custom' ? undefined : findSize(s.size);
  const material = s.material === 'auto' ? (size?.material ?? 'pvc') : s.material;
  return {
    inner_diameter_m: size ? size.inner_diameter_m : s.diameter_m,
    length_m: s.length_m,
    material,
    entrance_k: entranceK(s.entrance),
    fittings: s.fittings.filter((f) => f.id && f.count >= 1).map((f) => ({ id: f.id, count: f.count })),
    parallel_lines: s.parallel,
  };
}

export function fluidInput(s: LineFieldsState): FluidInput {
  return { water_temperature_c: engineWaterTemperatureC(s.temp_c) };
}

export function siteInput(s: LineFieldsState): SiteInput {
  return s.site_mode === 'barometer' ? { atmospheric_pressure_pa: s.pressure_pa } : { altitude_m: s.altitude_m };
}
