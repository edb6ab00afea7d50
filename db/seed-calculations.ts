import { ENGINE_VERSION, solveDrain, solveLine, solveSiphon } from '../src/lib/hydraulics';
import type { DrainRequest, LineRequest, SiphonRequest } from '../src/lib/hydraulics/types';

/** A demo calculation attached to a demo job; results are computed by the engine at seed time. */
export interface DemoCalculation {
  id: string;
  jobId: string;
  tool: 'line' | 'siphon' | 'drain';
  label: string;
  inputs: unknown;
  results: unknown;
  unitSystem: 'metric' | 'us';
  engineVersion: string;
}

// Invented set-ups for the invented demo jobs (see db/seed.ts).
const koiPond: DrainRequest = {
  fluid: { water_temperature_c: 12 },
  vessel: { shape: 'sloped_pond', bottom_length_m: 4, bottom_width_m: 2.5, side_slope_h_per_v: 2, depth_m: 1.2 },
  initial_depth_m: 1.1,
  final_depth_m: 0.1,
  outlet: {
    type: 'siphon',
    line: { inner_diameter_m: 0.0381, length_m: 18, material: 'suction-hose-smooth', entrance_k: 0.5 },
    intake_elevation_m: 0.05,
    crest_elevation_m: 1.6,
    length_to_crest_m: 4,
    outlet_elevation_m: -1.5,
  },
};

const basement: LineRequest = {
  fluid: { water_temperature_c: 10 },
  line: { inner_diameter_m: 0.0508, length_m: 25, material: 'layflat-hose', fittings: [{ id: 'elbow-90-standard', count: 2 }] },
  source_level_m: 0.3,
  outlet_elevation_m: -2.4,
};

const rainTank: SiphonRequest = {
  fluid: { water_temperature_c: 16 },
  site: { altitude_m: 240 },
  line: { inner_diameter_m: 0.01905, length_m: 12, material: 'garden-hose' },
  source_level_m: 1.9,
  outlet_elevation_m: -0.8,
  crest_elevation_m: 2.3,
  length_to_crest_m: 2.5,
};

/** The demo calculations, solved by the current engine. */
export function demoCalculations(): DemoCalculation[] {
  const common = { unitSystem: 'metric' as const, engineVersion: ENGINE_VERSION };
  return [
    { id: 'calc_demo_koi', jobId: 'job_demo_koi', tool: 'drain', label: 'Siphon the pond down to 10 cm', inputs: koiPond, results: solveDrain(koiPond), ...common },
    { id: 'calc_demo_basement', jobId: 'job_demo_basement', tool: 'line', label: 'Lay-flat to the back fence', inputs: basement, results: solveLine(basement), ...common },
    { id: 'calc_demo_tank', jobId: 'job_demo_tank', tool: 'siphon', label: 'Over the tank wall', inputs: rainTank, results: solveSiphon(rainTank), ...common },
  ];
}
