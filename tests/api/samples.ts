/**
 * Valid requests used across the API tests (invented site figures, not measurements).
 */
export const lineRequest = {
  line: { inner_diameter_m: 0.0508, length_m: 40, material: 'layflat-hose', minor_loss_k: 0.6 },
  source_level_m: 3.2,
  outlet_elevation_m: 0,
};

export const siphonRequest = {
  fluid: { water_temperature_c: 12 },
  site: { altitude_m: 250 },
  line: { inner_diameter_m: 0.0381, length_m: 25, material: 'pvc', entrance_k: 0.5 },
  source_level_m: 2,
  outlet_elevation_m: -1.5,
  crest_elevation_m: 4,
  length_to_crest_m: 6,
};

export const drainRequest = {
  vessel: { shape: 'box', length_m: 4, width_m: 3, depth_m: 2 },
  initial_depth_m: 1.8,
  final_depth_m: 0.05,
  outlet: { type: 'orifice', diameter_m: 0.05 },
  curve_points: 11,
};

/** A deep copy with one dotted path set (undefined deletes it). */
export function withField<T>(base: T, path: string, value: unknown): T {
  const copy = structuredClone(base) as Record<string, unknown>;
  const keys = path.split('.');
  let at: Record<string, unknown> = copy;
  for (const k of keys.slice(0, -1)) at = at[k] as Record<string, unknown>;
  const last = keys[keys.length - 1];
  if (value === undefined) delete at[last];
  else at[last] = value;
  return copy as T;
}
