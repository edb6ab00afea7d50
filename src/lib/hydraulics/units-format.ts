/**
 * Text for numbers with their units, in the crew's own unit system. Conversions are those of
 * `units.ts`; this file only decides how many digits to show.
 */

import { toDisplay, unitLabel } from './units';
import type { QuantityKind, UnitId, UnitSystem } from './units';

/** Narrow no-break space: groups digits of large numbers (NIST SP 811 §10.5.3 style). */
const GROUP = '\u202f';

/**
 * A number rounded to `digits` significant figures (default 3), in plain decimal notation, never
 * exponent notation; digits of numbers ≥ 10 000 are grouped in threes. Non-finite values give '—'.
 */
export function formatNumber(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '—';
  if (!Number.isInteger(digits) || digits < 1 || digits > 15) {
    throw new RangeError(`digits must be an integer from 1 to 15, got ${digits}`);
  }
  if (value === 0) return '0';
  // toPrecision does the rounding; the decimals are counted after it, so 0.99951 → "1.00".
  const rounded = Number(value.toPrecision(digits));
  const magnitude = Math.floor(Math.log10(Math.abs(rounded)));
  const text = rounded.toFixed(Math.min(Math.max(0, digits - 1 - magnitude), 20));
  const [whole, frac] = text.split('.') as [string, string | undefined];
  const sign = whole.startsWith('-') ? '-' : '';
  const digitsOnly = sign ? whole.slice(1) : whole;
  const grouped =
    digitsOnly.length > 4 ? digitsOnly.replace(/\B(?=(\d{3})+(?!\d))/g, GROUP) : digitsOnly;
  const out = `${sign}${grouped}${frac ? `.${frac}` : ''}`;
  return out === '-0' || /^-0\.0*$/.test(out) ? out.slice(1) : out;
}

/**
 * Whole seconds as hours and minutes, "h:mm" (e.g. 3725 s → "1:02"), rounded to the nearest
 * minute. Under a minute the seconds are shown instead ("45 s") so a short run is not "0:00".
 */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return '—';
  if (seconds < 59.5) return `${Math.round(seconds)} s`;
  const minutes = Math.round(seconds / 60);
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return `${h}:${String(m).padStart(2, '0')}`;
}

/**
 * An SI value as display text with its unit, e.g. formatQuantity('flow', 0.001, 'us') =
 * "15.9 US gal/min", formatQuantity('temperature', 15, 'us') = "59.0 °F".
 * Time is shown as h:mm ("1:02 h:min"), or in seconds under a minute.
 */
export function formatQuantity(
  kind: QuantityKind,
  si: number,
  system: UnitSystem,
  digits = 3,
  unit?: UnitId,
): string {
  if (kind === 'time') {
    const text = formatDuration(si);
    return text.endsWith(' s') || text === '—' ? text : `${text} h:min`;
  }
  // A space before every unit symbol, °C and °F included (NIST SP 811 §7.2).
  const label = unitLabel(kind, system, unit);
  return `${formatNumber(toDisplay(kind, si, system, unit), digits)} ${label}`;
}
