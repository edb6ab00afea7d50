/**
 * Calculator inputs ↔ a query string, so a link reproduces a result. Values travel in SI (the
 * engine's units), so a link made in US customary opens correctly in metric and vice versa.
 * Numbers are written with String(), which round-trips every double exactly.
 *
 * A tool starts a US crew on values that are round in feet and gallons, everyone else on the
 * metric ones. A link lists what differs from the starting values it was made on and names
 * them (`start=us`); a link without `start` builds on the metric ones (every link made before
 * the US start did), and only a bare address starts the visitor on their own.
 */
import type { UnitSystem } from './hydraulics/units';
import { isUnitSystem } from './hydraulics/units';

/** A calculator's inputs: flat, numbers in SI, choices as strings, lists as arrays of records. */
export type ShareValue = number | string | boolean | ShareRow[];
export type ShareRow = Record<string, number | string>;
export type ShareState = Record<string, ShareValue>;

const ROW_SEP = ';';
const COL_SEP = '~';

function encodeRows(rows: ShareRow[], keys: string[]): string {
  return rows.map((r) => keys.map((k) => String(r[k] ?? '')).join(COL_SEP)).join(ROW_SEP);
}

function decodeRows(text: string, template: ShareRow): ShareRow[] {
  const keys = Object.keys(template);
  return text
    .split(ROW_SEP)
    .filter(Boolean)
    .map((row) => {
      const cols = row.split(COL_SEP);
      const out: ShareRow = {};
      keys.forEach((k, i) => {
        const raw = cols[i] ?? '';
        out[k] = typeof template[k] === 'number' ? Number(raw) : raw;
      });
      return out;
    })
    .filter((r) => keys.every((k) => typeof r[k] !== 'number' || Number.isFinite(r[k])));
}

/**
 * Query string for the values that differ from the defaults (short links); list fields use the
 * keys of the default's first row, or of `rowKeys` when the default list is empty.
 */
export function encodeShare(
  state: ShareState,
  defaults: ShareState,
  rowKeys: Record<string, string[]> = {},
): string {
  const q = new URLSearchParams();
  for (const [key, value] of Object.entries(state)) {
    const dflt = defaults[key];
    if (Array.isArray(value)) {
      const keys = rowKeys[key] ?? Object.keys((dflt as ShareRow[] | undefined)?.[0] ?? value[0] ?? {});
      const text = encodeRows(value, keys);
      if (!Array.isArray(dflt) || text !== encodeRows(dflt, keys)) q.set(key, text);
    } else if (value !== dflt) {
      q.set(key, typeof value === 'boolean' ? (value ? '1' : '0') : String(value));
    }
  }
  return q.toString();
}

/**
 * Inputs from a query string, each field typed like its default; unknown keys and unreadable
 * values are ignored so an edited or old link still opens with defaults.
 */
export function decodeShare<T extends ShareState>(
  query: string,
  defaults: T,
  rowTemplates: Record<string, ShareRow> = {},
): T {
  const q = new URLSearchParams(query);
  const out: ShareState = { ...defaults };
  for (const [key, dflt] of Object.entries(defaults)) {
    const raw = q.get(key);
    if (raw === null) continue;
    if (Array.isArray(dflt)) {
      const template = rowTemplates[key] ?? dflt[0];
      if (template) out[key] = decodeRows(raw, template);
    } else if (typeof dflt === 'number') {
      const n = Number(raw);
      if (raw.trim() !== '' && Number.isFinite(n)) out[key] = n;
    } else if (typeof dflt === 'boolean') {
      out[key] = raw === '1';
    } else {
      out[key] = raw;
    }
  }
  return out as T;
}

/** Query key naming the starting values a link builds on. */
export const START_KEY = 'start';

/** The starting values a query builds on; `own` (the visitor's units) for a bare address. */
export function startOf(query: string, own: UnitSystem): UnitSystem {
  const q = new URLSearchParams(query);
  const named = q.get(START_KEY);
  if (isUnitSystem(named)) return named;
  return q.keys().next().done ? own : 'metric';
}

/**
 * The link query for `state` made on the `start` values `base`. It is never empty, so that a
 * link to an unchanged metric start does not open on a US visitor's own start.
 */
export function shareQuery(
  state: ShareState,
  start: UnitSystem,
  base: ShareState,
  rowKeys: Record<string, string[]> = {},
): string {
  const changes = encodeShare(state, base, rowKeys);
  if (start === 'metric' && changes) return changes;
  return changes ? `${START_KEY}=${start}&${changes}` : `${START_KEY}=${start}`;
}
