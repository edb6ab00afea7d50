/**
 * "What would help" for a drain-down: one more line or hole, the next hose size up, a lower
 * intake, and — for a time the job may take — the smallest size that makes it.
 */
import type { DrainRequest, DrainResult, OutletInput, UnitSystem } from '../hydraulics';
import { findSize, formatQuantity, solveDrain } from '../hydraulics';
import { smallestSizeForDrain } from '../hydraulics/drain-sizing';
import type { Hint } from './hints';
import { nextSizeUp } from './hints';

const time = (s: number, sys: UnitSystem): string => formatQuantity('time', s, sys);

function withOutlet(req: DrainRequest, change: (o: OutletInput) => OutletInput): DrainResult | null {
  try {
    return solveDrain({ ...req, outlet: change(req.outlet as OutletInput) });
  } catch {
    return null;
  }
}

function moreOutlets(req: DrainRequest, sizeId: string, sys: UnitSystem): Hint[] {
  const o = req.outlet as OutletInput;
  const out: Hint[] = [];
  if (o.type === 'orifice') {
    const n = (o.count ?? 1) + 1;
    const r = withOutlet(req, () => ({ ...o, count: n }));
    if (r) out.push({ id: 'more-lines', text: `More outlets: ${n} holes like this take ${time(r.time_s, sys)}.` });
    return out;
  }
  const n = (o.line.parallel_lines ?? 1) + 1;
  const more = withOutlet(req, () => ({ ...o, line: { ...o.line, parallel_lines: n } }));
  if (more && n <= 50) out.push({ id: 'more-lines', text: `More lines: ${n} lines side by side take ${time(more.time_s, sys)}.` });
  const up = nextSizeUp(sizeId);
  if (up) {
    const r = withOutlet(req, () => ({ ...o, line: { ...o.line, inner_diameter_m: up.inner_diameter_m } }));
    if (r) out.push({ id: 'larger-hose', text: `Larger hose: a ${sys === 'us' ? up.name_us : up.name_metric} takes ${time(r.time_s, sys)}${r.status === 'stops_early' ? ' but stops early' : ''}.` });
  }
  return out;
}

function targetHints(req: DrainRequest, r: DrainResult, target: number, sizeId: string, sys: UnitSystem): Hint[] {
  const o = req.outlet as OutletInput;
  const out: Hint[] = [];
  if (r.status === 'drains' && r.time_s > target)
    out.push({ id: 'more-time', text: `More time: it needs ${time(r.time_s, sys)}, ${time(r.time_s - target, sys)} more than you have.` });
  if (r.status === 'drains' && r.time_s <= target) out.push({ id: 'in-time', text: `It makes your time with ${time(target - r.time_s, sys)} to spare.` });
  if (o.type === 'orifice') return out;
  try {
    const { inner_diameter_m: _d, ...line } = o.line;
    const family = findSize(sizeId)?.family;
    const sized = smallestSizeForDrain({ ...req, outlet: { ...o, line }, target_time_s: target, ...(family ? { families: [family] } : {}) });
    out.push({
      id: 'size-for-time',
      text: sized.size ? `Smallest size in this range that makes it in time: ${sys === 'us' ? sized.size.name_us : sized.size.name_metric}.` : 'No catalogue size makes it in that time; add lines or allow more time.',
    });
  } catch {
    // the sizing search needs valid inputs; the main result already says what is wrong
  }
  return out;
}

export function drainHints(req: DrainRequest, r: DrainResult, sizeId: string, target: number, sys: UnitSystem): Hint[] {
  const out: Hint[] = [];
  if (r.stop_reason === 'intake_uncovered' && r.status !== 'drains')
    out.push({ id: 'lower-intake', text: 'Lower intake: put the intake or hole lower to take the level further down.' });
  if (r.stop_reason === 'siphon_breaks')
    out.push({ id: 'lower-crest', text: 'Lower crest: the siphon breaks as the level falls; a lower crest or a lower outlet keeps it running longer.' });
  if (r.stop_reason === 'no_head' && r.status !== 'drains')
    out.push({ id: 'lower-outlet', text: 'Lower outlet: the water runs out of head; put the outlet lower.' });
  if (r.status !== 'no_flow') out.push(...moreOutlets(req, sizeId, sys));
  if (target > 0 && r.status !== 'no_flow') out.push(...targetHints(req, r, target, sizeId, sys));
  return out;
}

/** One job for the hints, as the page hands it to the worker (or works it out itself). */
export interface DrainHintsJob {
  req: DrainRequest;
  r: DrainResult;
  size: string;
  target: number;
  system: UnitSystem;
}

/** The hints for one job; none where the solvers cannot take it (extras: the result stands). */
export function hintsForJob({ req, r, size, target, system }: DrainHintsJob): Hint[] {
  try {
    return drainHints(req, r, size, target, system);
  } catch {
    return [];
  }
}
