/**
 * What a number box makes of its text: a value in SI, or the problem to show under the box in
 * the crew's own units. Parsing is number-text.ts (locale rules); units are units.ts.
 */
import type { QuantityKind, UnitSystem } from '../hydraulics/units';
import { fromDisplay, toDisplay, unitLabel } from '../hydraulics/units';
import { WATER_T_MAX_C, WATER_T_MIN_C } from '../hydraulics/water';
import { MAX_LINE_LENGTH_M } from '../hydraulics/line-resolve';
import { readNumberText, writeNumberText } from '../number-text';

/** Lowest and highest SI value a box accepts. */
export type FieldRange = readonly [number, number];

/** Line and hose lengths, m (API v1's limits). */
export const LINE_LENGTH_RANGE: FieldRange = [0, MAX_LINE_LENGTH_M];

/** Water temperature as the box's hint gives it: 0–99 °C (32–210 °F). */
export const WATER_TEMPERATURE_RANGE: FieldRange = [0, WATER_T_MAX_C];

export interface FieldSpec {
  locale?: string;
  system: UnitSystem;
  kind?: QuantityKind;
  /** Unit text of a plain number, for its range message. */
  unit?: string;
  range?: FieldRange;
}

export type FieldRead = { ok: true; si: number } | { ok: false; empty: boolean; problem: string };

/** Relative slack on a bound, so a value converted from °F or ft that lands a hair outside passes. */
const BOUND_SLACK = 1e-9;

const display = (si: number, f: FieldSpec): number =>
  f.kind ? toDisplay(f.kind, si, f.system) : si;

/** "Out of range: use 32 to 210.2 °F". */
export function rangeText(range: FieldRange, f: FieldSpec): string {
  const unit = f.kind ? unitLabel(f.kind, f.system) : (f.unit ?? '');
  const [lo, hi] = range.map((b) => writeNumberText(display(b, f), f.locale));
  return `Out of range: use ${lo} to ${hi}${unit ? ` ${unit}` : ''}`;
}

/** Read a box's text as an SI value, inside its range (clamped to it within the slack). */
export function readField(text: string, f: FieldSpec): FieldRead {
  const r = readNumberText(text, f.locale);
  if (!r.ok) return r;
  const si = f.kind ? fromDisplay(f.kind, r.value, f.system) : r.value;
  if (!Number.isFinite(si))
    return { ok: false, empty: false, problem: f.range ? rangeText(f.range, f) : 'Too large' };
  if (!f.range) return { ok: true, si };
  const [lo, hi] = f.range;
  const slack = BOUND_SLACK * Math.max(Math.abs(lo), Math.abs(hi), 1);
  if (si < lo - slack || si > hi + slack)
    return { ok: false, empty: false, problem: rangeText(f.range, f) };
  return { ok: true, si: Math.min(hi, Math.max(lo, si)) };
}

/**
 * Water temperature for the engine, °C. Its property equations start at the triple point,
 * 0.01 °C; ice water typed as 0 °C or 32 °F is sent as that, a difference far below what the
 * results show.
 */
export function engineWaterTemperatureC(tC: number): number {
  return tC >= 0 && tC < WATER_T_MIN_C ? WATER_T_MIN_C : tC;
}
