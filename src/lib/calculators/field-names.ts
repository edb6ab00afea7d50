/**
 * Engine error paths in the words the tools' labels use, so a message names the box to fix.
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
};

/** "Line length must be …." for an engine input error; other errors are rethrown. */
export function inputErrorText(e: unknown): string {
  if (!(e instanceof EngineInputError)) throw e;
  const bare = e.path.replace(/^outlet(\[\d+\])?\./, '').replace(/^vessel\./, 'vessel ');
  const name = NAMES[bare] ?? NAMES[e.path] ?? bare.replace(/_m\d?$|_/g, ' ').trim();
  return `${name.charAt(0).toUpperCase()}${name.slice(1)} ${e.message}.`;
}
