/**
 * "What would help": the same set-up with one thing changed — a larger hose, a shorter run, one
 * more line, a lower crest — and, for a target flow, the engine's inverse answers (lines needed,
 * smallest size, fall needed).
 */
import type { LineRequest, SiphonRequest, SiphonResult, UnitSystem } from '../hydraulics';
import {
  G,
  findSize,
  resolveFluid,
  formatQuantity,
  headForFlow,
  linesForFlow,
  sizes,
  smallestSizeForFlow,
  solveLine,
  solveSiphon,
  workingCrestPressure,
} from '../hydraulics';

export interface Hint {
  id: string;
  text: string;
}

const pct = (a: number, b: number): string => {
  const d = Math.round(((a - b) / b) * 100);
  return d >= 0 ? `+${d} %` : `${d} %`;
};

/** The next larger catalogue size of the same family, or undefined. */
export function nextSizeUp(sizeId: string): ReturnType<typeof findSize> {
  const size = findSize(sizeId);
  if (!size) return undefined;
  return sizes
    .filter((z) => z.family === size.family && z.inner_diameter_m > size.inner_diameter_m)
    .sort((a, b) => a.inner_diameter_m - b.inner_diameter_m)[0];
}

type Solve = (req: LineRequest) => { flow_m3_s: number; status: string };

function variantHints(req: LineRequest, sizeId: string, base: number, solve: Solve, sys: UnitSystem): Hint[] {
  const out: Hint[] = [];
  const flow = (q: number): string => formatQuantity('flow', q, sys);
  const up = nextSizeUp(sizeId);
  if (up) {
    const r = solve({ ...req, line: { ...req.line, inner_diameter_m: up.inner_diameter_m } });
    const note = r.status === 'breaks' || r.status === 'marginal' ? ', but the crest gets closer to its limit' : '';
    out.push({ id: 'larger-hose', text: `Larger hose: a ${sys === 'us' ? up.name_us : up.name_metric} would carry ${flow(r.flow_m3_s)} (${pct(r.flow_m3_s, base)})${note}.` });
  }
  if (req.line.length_m > 0) {
    const r = solve({ ...req, line: { ...req.line, length_m: req.line.length_m * 0.75 } });
    out.push({ id: 'shorter-run', text: `Shorter run: a quarter less hose (${formatQuantity('length', req.line.length_m * 0.75, sys)}) gives ${flow(r.flow_m3_s)} (${pct(r.flow_m3_s, base)}).` });
  }
  const n = req.line.parallel_lines ?? 1;
  if (n < 50) {
    const r = solve({ ...req, line: { ...req.line, parallel_lines: n + 1 } });
    out.push({ id: 'more-lines', text: `More lines: ${n + 1} lines side by side carry ${flow(r.flow_m3_s)} together.` });
  }
  return out;
}

function targetHints(req: LineRequest, target: number, sizeId: string, sys: UnitSystem): Hint[] {
  const out: Hint[] = [];
  const t = formatQuantity('flow', target, sys);
  const lines = linesForFlow({ ...req, flow_m3_s: target });
  out.push({
    id: 'lines-for-target',
    text: lines.parallel_lines === null
      ? `No number of these lines up to 50 reaches ${t} at this fall.`
      : `${lines.parallel_lines} of these lines side by side reach ${t}.`,
  });
  const family = findSize(sizeId)?.family;
  const { line } = req;
  const { inner_diameter_m: _bore, ...sizeless } = line;
  const sized = smallestSizeForFlow({ ...req, line: sizeless, flow_m3_s: target, ...(family ? { families: [family] } : {}) });
  out.push({
    id: 'size-for-target',
    text: sized.size ? `Smallest size in this range that reaches ${t}: ${sys === 'us' ? sized.size.name_us : sized.size.name_metric}.` : `No size in this range reaches ${t} with this fall.`,
  });
  const head = headForFlow({ fluid: req.fluid, line, flow_m3_s: target });
  out.push({ id: 'fall-for-target', text: `Fall needed for ${t} with this line: ${formatQuantity('length', head.head_m, sys)} from water surface to outlet.` });
  return out;
}

export function lineHints(req: LineRequest, sizeId: string, target: number, sys: UnitSystem): Hint[] {
  const base = solveLine(req).flow_m3_s;
  if (!(base > 0)) return [{ id: 'no-head', text: 'Lower the outlet below the water surface (or the tailwater) to get any flow.' }];
  return [...variantHints(req, sizeId, base, solveLine, sys), ...(target > 0 ? targetHints(req, target, sizeId, sys) : [])];
}

export function siphonHints(req: SiphonRequest, r: SiphonResult, sizeId: string, target: number, sys: UnitSystem): Hint[] {
  if (r.status === 'no_flow') return [{ id: 'no-head', text: 'Lower the outlet below the source surface: a siphon needs its outlet below the water it draws from.' }];
  const out: Hint[] = [];
  const above = req.crest_elevation_m - req.source_level_m;
  const floor = workingCrestPressure(r.crest_limit_pa, r.vapor_pressure_pa);
  const marginM = (r.crest_pressure_abs_pa - floor) / (G * resolveFluid(req.fluid).density_kg_m3);
  if (r.status !== 'runs')
    out.push({ id: 'lower-crest', text: `Lower crest: bring the crest down by about ${formatQuantity('length', -marginM, sys)} (to ${formatQuantity('length', above + marginM, sys)} above the water) to get inside the working limit.` });
  const solve: Solve = (q) => solveSiphon({ ...req, ...q });
  return [...out, ...variantHints(req, sizeId, r.flow_m3_s, solve, sys), ...(target > 0 ? targetHints(req, target, sizeId, sys) : [])];
}
