/**
 * The gravity-line and siphon tools' inputs and requests. Levels are elevations above one datum
 * the crew picks (the siphon defaults take the source surface as 0, the line defaults its outlet).
 */
import type { LineRequest, SiphonRequest } from '../hydraulics';
import { findFitting } from '../hydraulics';
import type { LineFieldsState } from './tool-state';
import { LINE_FIELD_DEFAULTS, LINE_FIELD_US_START, fluidInput, lineInput, siteInput } from './tool-state';
import { ft, psia } from './us-start';

export interface LineToolState extends LineFieldsState {
  source_level_m: number;
  outlet_m: number;
  has_tail: boolean;
  tailwater_m: number;
  /** Target flow for the sizing hints, m³/s; 0 for none. */
  target_flow_m3_s: number;
}

export interface SiphonToolState extends LineToolState {
  crest_m: number;
  length_to_crest_m: number;
  k_to_crest: number;
  limit_mode: 'default' | 'custom';
  min_crest_pa: number;
}

export const LINE_TOOL_DEFAULTS: LineToolState = {
  ...LINE_FIELD_DEFAULTS,
  source_level_m: 3,
  outlet_m: 0,
  has_tail: false,
  tailwater_m: 0,
  target_flow_m3_s: 0,
};

export const SIPHON_TOOL_DEFAULTS: SiphonToolState = {
  ...LINE_TOOL_DEFAULTS,
  size: 'suction-hose-1-5in',
  length_m: 20,
  source_level_m: 0,
  outlet_m: -2.5,
  crest_m: 1.8,
  length_to_crest_m: 6,
  k_to_crest: 0,
  limit_mode: 'default',
  min_crest_pa: 25_000,
};

/** A US crew's starting values (us-start.ts). */
export const LINE_TOOL_US_START: Partial<LineToolState> = {
  ...LINE_FIELD_US_START,
  source_level_m: ft(10),
};

export const SIPHON_TOOL_US_START: Partial<SiphonToolState> = {
  ...LINE_FIELD_US_START,
  length_m: ft(65),
  outlet_m: ft(-8),
  crest_m: ft(6),
  length_to_crest_m: ft(20),
  min_crest_pa: psia(3.5),
};

/** Entrance K of a catalogue entrance id (sharp edge when unknown). */
export const entranceK = (id: string): number => findFitting(id)?.k ?? 0.5;

export function lineToolRequest(s: LineToolState): LineRequest {
  return {
    fluid: fluidInput(s),
    site: siteInput(s),
    line: lineInput(s, entranceK),
    source_level_m: s.source_level_m,
    outlet_elevation_m: s.outlet_m,
    ...(s.has_tail ? { tailwater_level_m: s.tailwater_m } : {}),
  };
}

export function siphonToolRequest(s: SiphonToolState): SiphonRequest {
  return {
    ...lineToolRequest(s),
    crest_elevation_m: s.crest_m,
    length_to_crest_m: s.length_to_crest_m,
    minor_loss_k_to_crest: s.k_to_crest,
    ...(s.limit_mode === 'custom' ? { min_crest_pressure_pa: s.min_crest_pa } : {}),
  };
}
