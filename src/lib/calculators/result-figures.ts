/**
 * Each tool's result figures in the tools' own words, with their kinds (formatted by whoever
 * shows them, in the crew's units). The tool pages and the client report both read them here, so
 * a figure has one name wherever it appears.
 */
import type { DrainResult, LineResult, SiphonResult } from '../hydraulics';
import type { Figure } from './quick-result';
import { crestPressureFigure, leadWithCrestWhenBroken, siphonFlowFigure } from './siphon-figures';

/** The figures every full-pipe result shows. */
export function lineFigures(r: LineResult | SiphonResult): Figure[] {
  return [
    { id: 'flow', label: 'Flow', kind: 'flow', si: r.flow_m3_s },
    { id: 'head', label: 'Head', kind: 'length', si: r.head_m },
    { id: 'velocity', label: 'Speed in the line', kind: 'velocity', si: r.velocity_m_s },
  ];
}

export function siphonFigures(r: SiphonResult): Figure[] {
  return leadWithCrestWhenBroken(r, [
    ...lineFigures(r).map((f) => (f.id === 'flow' ? siphonFlowFigure(r) : f)),
    crestPressureFigure(r),
    { id: 'crest-limit', label: 'Working limit at the crest', kind: 'pressure', si: r.crest_limit_pa },
    { id: 'vapour', label: 'Vapour pressure', kind: 'pressure', si: r.vapor_pressure_pa },
    {
      id: 'max-crest',
      label: 'Highest crest above the water',
      kind: 'length',
      si: r.max_crest_height_m,
      note: 'where crest pressure meets vapour pressure',
    },
    { id: 'priming', label: 'Water to prime', kind: 'volume', si: r.priming_volume_m3 },
  ]);
}

export function drainFigures(r: DrainResult): Figure[] {
  return [
    { id: 'time', label: 'Time to the stop', kind: 'time', si: r.status === 'no_flow' ? Infinity : r.time_s },
    { id: 'flow', label: 'Flow at the start', kind: 'flow', si: r.initial_flow_m3_s },
    { id: 'mean-flow', label: 'Average flow', kind: 'flow', si: r.mean_flow_m3_s },
    { id: 'volume', label: 'Water at the start', kind: 'volume', si: r.volume_initial_m3 },
    { id: 'drained', label: 'Water moved', kind: 'volume', si: r.volume_drained_m3 },
    { id: 'stop-depth', label: 'Depth at the stop', kind: 'length', si: r.stop_depth_m },
  ];
}

/** Why a drain-down stopped, finishing "It stops when …". */
export const STOP_WORDS: Record<DrainResult['stop_reason'], string> = {
  final_depth: 'it reaches the target depth',
  intake_uncovered: 'the level reaches the intake or hole',
  no_head: 'the head runs out (the level meets the outlet or tailwater)',
  siphon_breaks: 'the siphon’s crest pressure reaches its limit',
};

/**
 * 1234567 → "1,234,567". Not toLocaleString: its first call loads the browser's number-format
 * data, a long main-thread task on a slow phone just as the page becomes interactive.
 */
function groupThousands(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** Reynolds number, friction factor and regime, in words a crew can check. */
export function flowFactsText(r: Pick<LineResult, 'reynolds' | 'regime' | 'friction_factor'>): string {
  const f = r.friction_factor > 0 ? r.friction_factor.toFixed(4) : '—';
  return `Reynolds number ${groupThousands(Math.round(r.reynolds))} (${r.regime}), friction factor ${f}.`;
}
