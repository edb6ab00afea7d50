/**
 * The siphon figures whose meaning changes when the siphon breaks: past vapour pressure the
 * water boils at the crest and the line air-locks, so the computed absolute pressure (which can
 * come out below zero) and the full-bore flow describe nothing that will happen.
 */
import type { SiphonResult } from '../hydraulics';
import type { Figure } from './quick-result';

/** Pressure at the crest, or "below vapour pressure" in words once it is. */
export function crestPressureFigure(r: SiphonResult): Figure {
  const figure: Figure = {
    id: 'crest-pressure',
    label: 'Pressure at the crest',
    kind: 'pressure',
    si: r.crest_pressure_abs_pa,
  };
  if (r.crest_pressure_abs_pa >= r.vapor_pressure_pa) return figure;
  return {
    ...figure,
    text: 'below vapour pressure',
    note: 'the water boils at the crest and the line air-locks',
  };
}

/** The flow, named for what it is when the siphon cannot run full. */
export function siphonFlowFigure(r: SiphonResult): Figure {
  const flow: Figure = { id: 'flow', label: 'Flow', kind: 'flow', si: r.flow_m3_s };
  if (r.status !== 'breaks') return flow;
  return { ...flow, label: 'Flow if it ran full', note: 'it will not: lower the crest' };
}

/** Figures in the order a crew should read them: a broken siphon leads with why. */
export function leadWithCrestWhenBroken(r: SiphonResult, figures: Figure[]): Figure[] {
  if (r.status !== 'breaks') return figures;
  const crest = figures.filter((f) => f.id === 'crest-pressure');
  return [...crest, ...figures.filter((f) => f.id !== 'crest-pressure')];
}
