/**
 * The quick check: three set-ups with a handful of inputs each, turned into engine requests.
 * Levels are measured from the source's water surface (siphon, gravity line) or the tank's
 * bottom (empty a tank), so the crew types only heights they can see.
 */
import type { DrainRequest, LineRequest, OutletInput, SiphonRequest, VesselInput } from '../hydraulics';
import { ft, inch, usGal } from './us-start';

export type QuickMode = 'siphon' | 'line' | 'tank';

export interface QuickState {
  [key: string]: string | number;
  mode: QuickMode;
  /** Catalogue size id of the hose. */
  size: string;
  length_m: number;
  /** Siphon: crest height above the water surface, m. */
  crest_m: number;
  /** Siphon and line: outlet height below the water surface, m. */
  fall_m: number;
  /** Water to move, for a time estimate, m³. */
  volume_m3: number;
  tank_shape: 'box' | 'vertical_cylinder';
  tank_length_m: number;
  tank_width_m: number;
  tank_diameter_m: number;
  water_depth_m: number;
  tank_outlet: 'hose' | 'hole';
  /** Tank hose: outlet end below the tank bottom, m. */
  drop_m: number;
  hole_diameter_m: number;
}

export const QUICK_DEFAULTS: QuickState = {
  mode: 'siphon',
  size: 'suction-hose-1in',
  length_m: 15,
  crest_m: 1.5,
  fall_m: 2,
  volume_m3: 5,
  tank_shape: 'box',
  tank_length_m: 2,
  tank_width_m: 1.5,
  tank_diameter_m: 1.5,
  water_depth_m: 1.2,
  tank_outlet: 'hose',
  drop_m: 0.5,
  hole_diameter_m: 0.025,
};

/** A US crew's starting values (us-start.ts): the same kind of job, in round feet and gallons. */
export const QUICK_US_START: Partial<QuickState> = {
  length_m: ft(50),
  crest_m: ft(5),
  fall_m: ft(6),
  volume_m3: usGal(1500),
  tank_length_m: ft(6),
  tank_width_m: ft(5),
  tank_diameter_m: ft(5),
  water_depth_m: ft(4),
  drop_m: ft(1.5),
  hole_diameter_m: inch(1),
};

/** Hoses offered in the quick check (the full tools offer every catalogue size). */
export const QUICK_SIZE_FAMILIES = ['garden-hose', 'suction-hose', 'layflat-hose'] as const;

/**
 * Length from the intake to the crest, m. The quick check does not ask for it: it assumes the
 * hose is laid evenly, so the share up to the crest follows the vertical travel (up by the crest
 * height, then down by crest height + fall).
 */
export function quickLengthToCrest(s: QuickState): number {
  const up = Math.max(s.crest_m, 0);
  const down = up + Math.max(s.fall_m, 0);
  return up + down > 0 ? (s.length_m * up) / (up + down) : 0;
}

export function quickSiphonRequest(s: QuickState, innerDiameterM: number, material: string): SiphonRequest {
  return {
    line: { inner_diameter_m: innerDiameterM, length_m: s.length_m, material },
    source_level_m: 0,
    crest_elevation_m: s.crest_m,
    length_to_crest_m: quickLengthToCrest(s),
    outlet_elevation_m: -s.fall_m,
  };
}

export function quickLineRequest(s: QuickState, innerDiameterM: number, material: string): LineRequest {
  return {
    line: { inner_diameter_m: innerDiameterM, length_m: s.length_m, material },
    source_level_m: s.fall_m,
    outlet_elevation_m: 0,
  };
}

function quickVessel(s: QuickState): VesselInput {
  return s.tank_shape === 'box'
    ? { shape: 'box', length_m: s.tank_length_m, width_m: s.tank_width_m, depth_m: s.water_depth_m }
    : { shape: 'vertical_cylinder', diameter_m: s.tank_diameter_m, depth_m: s.water_depth_m };
}

export function quickDrainRequest(s: QuickState, innerDiameterM: number, material: string): DrainRequest {
  const outlet: OutletInput =
    s.tank_outlet === 'hole'
      ? { type: 'orifice', diameter_m: s.hole_diameter_m }
      : {
          type: 'line',
          line: { inner_diameter_m: innerDiameterM, length_m: s.length_m, material },
          outlet_elevation_m: -s.drop_m,
        };
  return { vessel: quickVessel(s), initial_depth_m: s.water_depth_m, outlet, curve_points: 60 };
}
