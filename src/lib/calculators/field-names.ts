/**
 * Engine paths in the words the tools' labels use, so an error message names the box to fix and
 * a report names each input as the tool did.
 */
import { EngineInputError } from '../hydraulics';

const NAMES: Record<string, string> = {
  'line.inner_diameter_m': 'Inside diameter',
  'line.length_m': 'Line length',
  'line.roughness_m': 'Roughness',
  'line.parallel_lines': 'Lines side by side',
  'line.fittings': 'Fittings',
  'fluid.water_temperature_c': 'Water temperature',
  'site.altitude_m': 'Altitude',
  'site.atmospheric_pressure_pa': 'Barometer reading',
  length_to_crest_m: 'Length to the crest',
  minor_loss_k_to_crest: 'Fittings K before the crest',
  min_crest_pressure_pa: 'Lowest crest pressure',
  initial_depth_m: 'Starting depth',
  final_depth_m: 'Target depth',
  flow_m3_s: 'Target flow',
  'line.material': 'Material (roughness)',
  'line.minor_loss_k': 'Fittings K',
  'line.entrance_k': 'Intake K',
  source_level_m: 'Source water surface',
  outlet_elevation_m: 'Outlet elevation',
  tailwater_level_m: 'Tailwater surface',
  crest_elevation_m: 'Crest elevation',
  intake_elevation_m: 'Intake elevation',
  bottom_elevation_m: 'Bottom elevation',
  type: 'Drains through',
  discharge_coefficient: 'Discharge coefficient',
  count: 'How many holes',
  'vessel.shape': 'Shape',
  'vessel.side_slope_h_per_v': 'Side slope',
};

const bareName = (path: string): string => path.replace(/^outlet(\[\d+\])?\./, '');

/** The tool's label for an engine path, e.g. "line.length_m" → "Line length". */
export function fieldLabel(path: string): string {
  const name = NAMES[path] ?? NAMES[bareName(path)] ?? (path.split('.').pop() ?? path).replace(/_m\d?$|_c$|_pa$/, '').replace(/_/g, ' ').trim();
  return `${name.charAt(0).toUpperCase()}${name.slice(1)}`;
}

/** "Line length must be …." for an engine input error; other errors are rethrown. */
export function inputErrorText(e: unknown): string {
  if (!(e instanceof EngineInputError)) throw e;
  const bare = bareName(e.path).replace(/^vessel\./, 'vessel ');
  const name = NAMES[bare] ?? NAMES[e.path] ?? bare.replace(/_m\d?$|_/g, ' ').trim();
  return `${name.charAt(0).toUpperCase()}${name.slice(1)} ${e.message}.`;
}
