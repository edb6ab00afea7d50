/**
 * The drain-down tool's inputs (every vessel shape, orifice / gravity line / siphon outlet) and
 * its engine request. Heights of intakes and holes are typed above the vessel's bottom; the
 * outlet, crest and tailwater as elevations above the same datum as the bottom.
 */
import type { DrainRequest, OutletInput, UnitSystem, VesselInput } from '../hydraulics';
import { formatQuantity } from '../hydraulics';
import { entranceK } from './line-tool';
import type { LineFieldsState } from './tool-state';
import { LINE_FIELD_DEFAULTS, LINE_FIELD_US_START, fluidInput, lineInput, siteInput } from './tool-state';
import { ft, ft2, inch } from './us-start';

export type VesselShape = VesselInput['shape'];

export interface StageRow {
  [key: string]: number;
  depth_m: number;
  area_m2: number;
}

export interface DrainToolState extends LineFieldsState {
  shape: VesselShape;
  v_length_m: number;
  v_width_m: number;
  v_depth_m: number;
  v_diameter_m: number;
  v_cone_height_m: number;
  v_bottom_length_m: number;
  v_bottom_width_m: number;
  v_slope: number;
  stage: StageRow[];
  bottom_m: number;
  initial_depth_m: number;
  final_depth_m: number;
  outlet: 'orifice' | 'line' | 'siphon';
  hole_diameter_m: number;
  cd: number;
  hole_height_m: number;
  hole_count: number;
  intake_height_m: number;
  outlet_m: number;
  has_tail: boolean;
  tailwater_m: number;
  crest_m: number;
  length_to_crest_m: number;
  k_to_crest: number;
  /** Time the job may take, for the hints, s; 0 for none. */
  target_time_s: number;
}

export const STAGE_ROW: StageRow = { depth_m: 0, area_m2: 0 };

export const DRAIN_TOOL_DEFAULTS: DrainToolState = {
  ...LINE_FIELD_DEFAULTS,
  length_m: 15,
  shape: 'box',
  v_length_m: 4,
  v_width_m: 3,
  v_depth_m: 1.5,
  v_diameter_m: 2,
  v_cone_height_m: 0.5,
  v_bottom_length_m: 6,
  v_bottom_width_m: 4,
  v_slope: 2,
  // tops out at the starting water depth, so choosing this shape gives a result at once
  stage: [
    { depth_m: 0, area_m2: 20 },
    { depth_m: 0.75, area_m2: 30 },
    { depth_m: 1.5, area_m2: 42 },
  ],
  bottom_m: 0,
  initial_depth_m: 1.5,
  final_depth_m: 0,
  outlet: 'line',
  hole_diameter_m: 0.05,
  cd: 0.61,
  hole_height_m: 0,
  hole_count: 1,
  intake_height_m: 0,
  outlet_m: -1,
  has_tail: false,
  tailwater_m: -1,
  crest_m: 2,
  length_to_crest_m: 3,
  k_to_crest: 0,
  target_time_s: 0,
};

/** A US crew's starting values (us-start.ts): the same pond and tank, in round feet. */
export const DRAIN_TOOL_US_START: Partial<DrainToolState> = {
  ...LINE_FIELD_US_START,
  length_m: ft(50),
  v_length_m: ft(12),
  v_width_m: ft(10),
  v_depth_m: ft(5),
  v_diameter_m: ft(6),
  v_cone_height_m: ft(1.5),
  v_bottom_length_m: ft(20),
  v_bottom_width_m: ft(12),
  stage: [
    { depth_m: 0, area_m2: ft2(200) },
    { depth_m: ft(2.5), area_m2: ft2(300) },
    { depth_m: ft(5), area_m2: ft2(450) },
  ],
  initial_depth_m: ft(5),
  hole_diameter_m: inch(2),
  outlet_m: ft(-3),
  tailwater_m: ft(-3),
  crest_m: ft(6),
  length_to_crest_m: ft(10),
};

export function vesselOf(s: DrainToolState): VesselInput {
  switch (s.shape) {
    case 'box':
      return { shape: 'box', length_m: s.v_length_m, width_m: s.v_width_m, depth_m: s.v_depth_m };
    case 'vertical_cylinder':
      return { shape: 'vertical_cylinder', diameter_m: s.v_diameter_m, depth_m: s.v_depth_m };
    case 'horizontal_cylinder':
      return { shape: 'horizontal_cylinder', diameter_m: s.v_diameter_m, length_m: s.v_length_m };
    case 'sphere':
      return { shape: 'sphere', diameter_m: s.v_diameter_m };
    case 'cone_bottom':
      return { shape: 'cone_bottom', diameter_m: s.v_diameter_m, cone_height_m: s.v_cone_height_m, depth_m: s.v_depth_m };
    case 'sloped_pond':
      return {
        shape: 'sloped_pond',
        bottom_length_m: s.v_bottom_length_m,
        bottom_width_m: s.v_bottom_width_m,
        side_slope_h_per_v: s.v_slope,
        depth_m: s.v_depth_m,
      };
    default:
      return { shape: 'stage_table', points: s.stage.map((r) => ({ depth_m: r.depth_m, area_m2: r.area_m2 })) };
  }
}

/** Full depth of the vessel as typed, m. */
export function vesselDepth(s: DrainToolState): number {
  if (s.shape === 'horizontal_cylinder' || s.shape === 'sphere') return s.v_diameter_m;
  if (s.shape === 'stage_table') return s.stage[s.stage.length - 1]?.depth_m ?? 0;
  return s.v_depth_m;
}

/**
 * The starting depth's problem in words that name what bounds it (the table's top row for a
 * depth–area table), in the crew's units; null when it fits. The engine's own message names
 * API fields, so the tool checks this first.
 */
export function startDepthProblem(s: DrainToolState, system: UnitSystem): string | null {
  const top = vesselDepth(s);
  // a vessel with no depth of its own is the engine's to name
  if (!(top > 0) || (s.initial_depth_m > 0 && s.initial_depth_m <= top * (1 + 1e-12))) return null;
  const bound = s.shape === 'stage_table' ? 'the table’s top depth' : 'the vessel’s full depth';
  return `Water depth now must be more than 0 and no more than ${bound}, ${formatQuantity('length', top, system)}.`;
}

export function outletOf(s: DrainToolState): OutletInput {
  if (s.outlet === 'orifice')
    return {
      type: 'orifice',
      diameter_m: s.hole_diameter_m,
      discharge_coefficient: s.cd,
      elevation_m: s.bottom_m + s.hole_height_m,
      count: s.hole_count,
    };
  const line = lineInput(s, entranceK);
  const tail = s.has_tail ? { tailwater_level_m: s.tailwater_m } : {};
  const intake = s.bottom_m + s.intake_height_m;
  if (s.outlet === 'line')
    return { type: 'line', line, intake_elevation_m: intake, outlet_elevation_m: s.outlet_m, ...tail };
  return {
    type: 'siphon',
    line,
    intake_elevation_m: intake,
    crest_elevation_m: s.crest_m,
    length_to_crest_m: s.length_to_crest_m,
    minor_loss_k_to_crest: s.k_to_crest,
    outlet_elevation_m: s.outlet_m,
    ...tail,
  };
}

export function drainToolRequest(s: DrainToolState): DrainRequest {
  return {
    fluid: fluidInput(s),
    site: siteInput(s),
    vessel: vesselOf(s),
    bottom_elevation_m: s.bottom_m,
    initial_depth_m: s.initial_depth_m,
    final_depth_m: s.final_depth_m,
    outlet: outletOf(s),
    curve_points: 101,
  };
}
