/**
 * A saved calculation as the report's label/value rows, in the words and units the tools show:
 * the verdict word, each tool's figures, and the inputs by their field labels, all in the unit
 * system the calculation was saved in.
 */
import { fieldLabel } from '../calculators/field-names';
import { OUTLET_TYPES, SHAPES } from '../calculators/input-words';
import { drainFigures, flowFactsText, lineFigures, siphonFigures, STOP_WORDS } from '../calculators/result-figures';
import type { Figure } from '../calculators/quick-result';
import { findFitting, findMaterial, formatQuantity } from '../hydraulics';
import type { DrainResult, LineResult, QuantityKind, SiphonResult, UnitSystem } from '../hydraulics';
import { headlineOf } from '../jobs/headline';
import type { SavedTool } from '../jobs/headline';

export interface Row {
  label: string;
  value: string;
}

const FIGURES: Record<SavedTool, (r: never) => Figure[]> = { line: lineFigures, siphon: siphonFigures, drain: drainFigures };

/** Verdict, stop, figures and flow facts of stored engine results; missing figures are left out. */
export function resultRows(tool: SavedTool, results: Record<string, unknown>, system: UnitSystem): Row[] {
  const rows: Row[] = [];
  const verdict = headlineOf(tool, results, system).verdict;
  if (verdict) rows.push({ label: 'Verdict', value: `${verdict.word}. ${verdict.reason}` });
  const stop = STOP_WORDS[results.stop_reason as DrainResult['stop_reason']];
  if (tool === 'drain' && stop) rows.push({ label: 'It stops when', value: stop });
  for (const f of FIGURES[tool](results as never)) {
    if (typeof f.si === 'number' && Number.isFinite(f.si)) rows.push({ label: f.label, value: formatQuantity(f.kind, f.si, system) });
  }
  if (tool !== 'drain' && typeof results.reynolds === 'number')
    rows.push({ label: 'In the line', value: flowFactsText(results as unknown as LineResult | SiphonResult) });
  return rows;
}

/** The unit kind of an API field, from its SI suffix. */
function kindOf(key: string): QuantityKind | null {
  if (key.endsWith('_m3_s')) return 'flow';
  if (key.endsWith('_m_s')) return 'velocity';
  if (key.endsWith('_m3')) return 'volume';
  if (key.endsWith('_m2')) return 'area';
  if (key.endsWith('_pa')) return 'pressure';
  if (key.endsWith('_c')) return 'temperature';
  if (key.endsWith('_s')) return 'time';
  if (key.endsWith('diameter_m')) return 'diameter';
  if (key.endsWith('roughness_m')) return 'roughness';
  if (key.endsWith('_m')) return 'length';
  return null;
}

const choice = (list: { value: string; label: string }[], v: unknown): string =>
  list.find((c) => c.value === v)?.label ?? String(v);

function valueText(key: string, v: unknown, system: UnitSystem): string {
  const kind = kindOf(key);
  if (typeof v === 'number' && kind) return formatQuantity(kind, v, system);
  if (typeof v === 'number') return String(Number(v.toPrecision(4)));
  if (key === 'material') return findMaterial(String(v))?.name ?? String(v);
  if (key === 'shape') return choice(SHAPES, v);
  if (key === 'type') return choice(OUTLET_TYPES, v);
  return String(v);
}

/** Engine settings that are not facts of the site: left out of a client's report. */
const NOT_SHOWN = new Set(['curve_points']);

/** Every input a crew typed, by its tool label (e.g. "Line length" = "18.0 m"). */
export function inputRows(value: unknown, system: UnitSystem, path = ''): Row[] {
  if (!value || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]): Row[] => {
    const p = path ? `${path}.${k}` : k;
    if (NOT_SHOWN.has(k)) return [];
    if (k === 'fittings' && Array.isArray(v)) {
      const items = v.map((f: { id?: string; count?: number }) => `${f.count ?? 1} × ${findFitting(String(f.id))?.name ?? f.id}`);
      return items.length ? [{ label: fieldLabel(p), value: items.join('; ') }] : [];
    }
    if (Array.isArray(v)) return [{ label: fieldLabel(p), value: `${v.length} rows` }];
    if (v && typeof v === 'object') return inputRows(v, system, p);
    return [{ label: fieldLabel(p), value: valueText(k, v, system) }];
  });
}
