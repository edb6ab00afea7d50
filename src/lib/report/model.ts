import { cautionIdsFor, cautionsFor } from '../cautions';
import { TOOL_NAMES } from '../jobs/client-api';
import type { Caution } from '../cautions';
import type { BrandRow } from '../data/brands';
import type { CalculationRow } from '../data/calculations';
import type { JobRow } from '../data/jobs';
import { formatQuantity } from '../hydraulics';
import type { QuantityKind, UnitSystem } from '../hydraulics';
import { drawdownFigure, lossFigure, schematicFigure } from './figures';
import type { Figure } from './figures';

export interface Row {
  label: string;
  value: string;
}

export interface ReportCalculation {
  id: string;
  title: string;
  tool: string;
  engineVersion: string;
  inputs: Row[];
  results: Row[];
  warnings: string[];
  figures: Figure[];
  cautions: Caution[];
}

export interface ReportModel {
  brand: BrandRow;
  job: JobRow;
  calculations: ReportCalculation[];
  assumptions: string[];
  disclaimer: string;
  generatedAt: Date;
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
  if (key.endsWith('_m')) return 'length';
  return null;
}

const words = (key: string): string => key.replace(/_(m3_s|m_s|m3|m2|pa|c|s|m)$/, '').replace(/_/g, ' ');

function show(key: string, v: unknown, system: UnitSystem): string {
  const kind = kindOf(key);
  if (typeof v === 'number' && kind) return formatQuantity(kind, v, system);
  if (typeof v === 'number') return String(Number(v.toPrecision(4)));
  return String(v);
}

/** Every leaf of a request as label/value rows (e.g. "line · length" = "18.0 m"). */
export function flatRows(value: unknown, system: UnitSystem, prefix = ''): Row[] {
  if (Array.isArray(value)) {
    if (value.length > 12) return [{ label: prefix, value: `${value.length} rows` }];
    return value.flatMap((v, i) => flatRows(v, system, `${prefix} ${i + 1}`));
  }
  if (value && typeof value === 'object') {
    return Object.entries(value).flatMap(([k, v]) => {
      const label = prefix ? `${prefix} · ${words(k)}` : words(k);
      return v && typeof v === 'object' ? flatRows(v, system, label) : [{ label, value: show(k, v, system) }];
    });
  }
  return [{ label: prefix, value: show(prefix, value, system) }];
}

const RESULT_KEYS = [
  'status', 'stop_reason', 'flow_m3_s', 'velocity_m_s', 'head_m', 'time_s', 'initial_flow_m3_s',
  'mean_flow_m3_s', 'volume_drained_m3', 'volume_left_m3', 'crest_pressure_abs_pa', 'crest_limit_pa',
  'max_crest_height_m', 'priming_volume_m3', 'reynolds', 'friction_factor', 'regime',
];

function resultRows(results: Record<string, unknown>, system: UnitSystem): Row[] {
  return RESULT_KEYS.filter((k) => results[k] !== undefined).map((k) => ({ label: words(k), value: show(k, results[k], system) }));
}

function figuresFor(c: CalculationRow, accent: string): Figure[] {
  const inp = c.inputs as Record<string, number>;
  const res = c.results as Record<string, unknown>;
  if (c.tool === 'drain') {
    const curve = (res.curve as { time_s: number; depth_m: number }[] | undefined) ?? [];
    return curve.length > 1 ? [drawdownFigure(curve, accent)] : [];
  }
  const crest = c.tool === 'siphon' ? Number(inp.crest_elevation_m) : null;
  const figs = [schematicFigure('The set-up in elevation (heights to scale)', Number(inp.source_level_m), Number(inp.outlet_elevation_m), crest, accent)];
  if (res.losses_m) figs.push(lossFigure(res.losses_m as Record<string, number>, accent));
  return figs;
}

/** The cautions of a saved calculation; a drain's follow its outlet (orifice, line, siphon). */
function cautionsOf(c: CalculationRow): ReturnType<typeof cautionsFor> {
  if (c.tool !== 'drain') return cautionsFor(cautionIdsFor({ tool: c.tool }));
  const type = (c.inputs as { outlet?: { type?: unknown } }).outlet?.type;
  const outlet = type === 'orifice' || type === 'line' || type === 'siphon' ? type : undefined;
  return cautionsFor(cautionIdsFor({ tool: 'drain', outlet }));
}

function reportCalc(c: CalculationRow, accent: string): ReportCalculation {
  const res = c.results as Record<string, unknown>;
  return {
    id: c.id,
    title: c.label || TOOL_NAMES[c.tool],
    tool: TOOL_NAMES[c.tool],
    engineVersion: c.engineVersion,
    inputs: flatRows(c.inputs, c.unitSystem),
    results: resultRows(res, c.unitSystem),
    warnings: ((res.warnings as { message: string }[] | undefined) ?? []).map((w) => w.message),
    figures: figuresFor(c, accent),
    cautions: cautionsOf(c),
  };
}

export const ASSUMPTIONS = [
  'Steady flow by the energy equation; friction by Darcy–Weisbach with the Colebrook–White friction factor (64/Re when laminar).',
  'Fittings and entrances by the K method, values from the catalogue sources listed in the app.',
  'Water properties from IAPWS-IF97; air pressure from the US Standard Atmosphere 1976 unless a barometer reading was given.',
  'Drain-down times integrate the falling head over the vessel shape given; the hose is assumed full and primed.',
];

export const DISCLAIMER =
  'These figures are engineering estimates from published methods and the inputs shown. They do not replace site judgement, local codes, permits or the advice of a licensed professional; where they differ, local codes and licensed practice govern.';

export function buildReport(brand: BrandRow, job: JobRow, calcs: CalculationRow[]): ReportModel {
  return {
    brand,
    job,
    calculations: calcs.map((c) => reportCalc(c, brand.accentColour)),
    assumptions: ASSUMPTIONS,
    disclaimer: DISCLAIMER,
    generatedAt: new Date(),
  };
}
