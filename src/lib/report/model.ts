import { cautionIdsFor, cautionsFor } from '../cautions';
import { TOOL_NAMES } from '../jobs/client-api';
import type { Caution } from '../cautions';
import type { BrandRow } from '../data/brands';
import type { CalculationRow } from '../data/calculations';
import type { JobRow } from '../data/jobs';
import { drawdownFigure, lossFigure, schematicFigure } from './figures';
import type { Figure } from './figures';
import { inputRows, resultRows } from './rows';
import type { Row } from './rows';

export type { Row } from './rows';

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

function figuresFor(c: CalculationRow, accent: string): Figure[] {
  const system = c.unitSystem;
  const inp = c.inputs as Record<string, number>;
  const res = c.results as Record<string, unknown>;
  if (c.tool === 'drain') {
    const curve = (res.curve as { time_s: number; depth_m: number }[] | undefined) ?? [];
    return curve.length > 1 ? [drawdownFigure(curve, accent, system)] : [];
  }
  const crest = c.tool === 'siphon' ? Number(inp.crest_elevation_m) : null;
  const figs = [schematicFigure('The set-up in elevation (heights to scale)', Number(inp.source_level_m), Number(inp.outlet_elevation_m), crest, accent, system)];
  if (res.losses_m) figs.push(lossFigure(res.losses_m as Record<string, number>, accent, system));
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
    inputs: inputRows(c.inputs, c.unitSystem),
    results: resultRows(c.tool, res, c.unitSystem),
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
