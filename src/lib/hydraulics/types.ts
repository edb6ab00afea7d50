/**
 * Request and result shapes of the hydraulics engine.
 *
 * They mirror the public calculation API v1 field for field (snake_case, SI units named in each
 * key) so that an endpoint can hand a validated request straight to the engine and return its
 * result unchanged. Optional fields take the API's defaults inside the engine, because the browser
 * islands call the engine directly without passing through the API's validation.
 */

/** Water at a temperature, 0.01–99 °C. */
export interface WaterInput {
  water_temperature_c: number;
}

/** Any other Newtonian liquid given by its properties, all > 0. */
export interface CustomLiquidInput {
  density_kg_m3: number;
  viscosity_pa_s: number;
  vapor_pressure_pa: number;
}

export type FluidInput = WaterInput | CustomLiquidInput;

/** Resolved liquid properties used by every solver. */
export interface FluidProps {
  density_kg_m3: number;
  viscosity_pa_s: number;
  vapor_pressure_pa: number;
}

/** Altitude (−500–6000 m, US Standard Atmosphere 1976) or a barometer reading (30–110 kPa). */
export type SiteInput = { altitude_m: number } | { atmospheric_pressure_pa: number };

export interface FittingCount {
  /** Catalogue id of a fitting. */
  id: string;
  /** Integer ≥ 1. */
  count: number;
}

/** A hose or pipe run of one inside diameter. */
export interface LineInput {
  inner_diameter_m: number;
  length_m: number;
  /** Absolute roughness; give this or `material`. */
  roughness_m?: number;
  /** Catalogue material id; give this or `roughness_m`. */
  material?: string;
  /** Sum of fittings' K along the line, entrance and exit excluded. Default 0. */
  minor_loss_k?: number;
  fittings?: FittingCount[];
  /** Default 0.5 (sharp-edged inlet). */
  entrance_k?: number;
  /** Identical lines side by side, 1–50. Default 1. */
  parallel_lines?: number;
}

export interface Warning {
  code: string;
  message: string;
}

export type Regime = 'laminar' | 'transitional' | 'turbulent';

export interface LossBreakdown {
  entrance: number;
  fittings: number;
  friction: number;
  exit: number;
}

export interface LineRequest {
  fluid?: FluidInput;
  site?: SiteInput;
  line: LineInput;
  source_level_m: number;
  outlet_elevation_m: number;
  tailwater_level_m?: number;
}

export interface LineResult {
  status: 'runs' | 'no_flow';
  head_m: number;
  /** All parallel lines together. */
  flow_m3_s: number;
  velocity_m_s: number;
  reynolds: number;
  friction_factor: number;
  regime: Regime;
  /** Head lost in each part, metres; they add up to head_m. */
  losses_m: LossBreakdown;
  warnings: Warning[];
  engine_version: string;
}

export interface SiphonRequest extends LineRequest {
  crest_elevation_m: number;
  length_to_crest_m: number;
  minor_loss_k_to_crest?: number;
  min_crest_pressure_pa?: number;
}

export interface SiphonResult extends Omit<LineResult, 'status'> {
  status: 'runs' | 'marginal' | 'breaks' | 'no_flow';
  atmospheric_pressure_pa: number;
  vapor_pressure_pa: number;
  crest_pressure_abs_pa: number;
  crest_limit_pa: number;
  max_crest_height_m: number;
  priming_volume_m3: number;
}

export type VesselInput =
  | { shape: 'box'; length_m: number; width_m: number; depth_m: number }
  | { shape: 'vertical_cylinder'; diameter_m: number; depth_m: number }
  | { shape: 'horizontal_cylinder'; diameter_m: number; length_m: number }
  | { shape: 'sphere'; diameter_m: number }
  | { shape: 'cone_bottom'; diameter_m: number; cone_height_m: number; depth_m: number }
  | {
      shape: 'sloped_pond';
      bottom_length_m: number;
      bottom_width_m: number;
      side_slope_h_per_v: number;
      depth_m: number;
    }
  | { shape: 'stage_table'; points: { depth_m: number; area_m2: number }[] };

export interface OrificeOutlet {
  type: 'orifice';
  diameter_m: number;
  /** Default 0.61. */
  discharge_coefficient?: number;
  /** Default the vessel bottom. */
  elevation_m?: number;
  /** Default 1. */
  count?: number;
}

export interface LineOutlet {
  type: 'line';
  line: LineInput;
  /** Default the vessel bottom. */
  intake_elevation_m?: number;
  outlet_elevation_m: number;
  tailwater_level_m?: number;
}

export interface SiphonOutlet {
  type: 'siphon';
  line: LineInput;
  intake_elevation_m: number;
  crest_elevation_m: number;
  length_to_crest_m: number;
  minor_loss_k_to_crest?: number;
  outlet_elevation_m: number;
  tailwater_level_m?: number;
  min_crest_pressure_pa?: number;
}

export type OutletInput = OrificeOutlet | LineOutlet | SiphonOutlet;

export interface DrainRequest {
  fluid?: FluidInput;
  site?: SiteInput;
  vessel: VesselInput;
  /** Default 0. */
  bottom_elevation_m?: number;
  initial_depth_m: number;
  /** Default 0. */
  final_depth_m?: number;
  /** One outlet as in API v1; the engine also accepts several working at once. */
  outlet: OutletInput | OutletInput[];
  /** Default 100, 2–2000. */
  curve_points?: number;
}

export type DrainStopReason = 'final_depth' | 'intake_uncovered' | 'no_head' | 'siphon_breaks';

export interface DrainCurvePoint {
  time_s: number;
  depth_m: number;
  flow_m3_s: number;
  volume_m3: number;
}

export interface DrainResult {
  status: 'drains' | 'stops_early' | 'no_flow';
  stop_reason: DrainStopReason;
  time_s: number;
  stop_depth_m: number;
  volume_initial_m3: number;
  volume_drained_m3: number;
  volume_left_m3: number;
  initial_flow_m3_s: number;
  mean_flow_m3_s: number;
  curve: DrainCurvePoint[];
  warnings: Warning[];
  engine_version: string;
}

/** An input the engine cannot compute with (unknown catalogue id, value out of range). */
export class EngineInputError extends Error {
  constructor(
    /** Dotted path of the offending field, as the API reports it (e.g. "line.material"). */
    readonly path: string,
    message: string,
  ) {
    super(message);
    this.name = 'EngineInputError';
  }
}
