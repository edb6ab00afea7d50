/**
 * The quick check's answer: the verdict, the figures with their kinds (formatted by the page in
 * the crew's units), what limits the result, and the cautions that apply to this set-up.
 */
import type { DrainResult, LineResult, QuantityKind, SiphonResult, Warning } from '../hydraulics';
import { EngineInputError, findSize, solveDrain, solveLine, solveSiphon, waterProperties } from '../hydraulics';
import type { BiggestLoss } from './limits';
import { biggestLoss } from './limits';
import { quickCrestMarginM } from './quick-crest-margin';
import type { QuickState } from './quick-check';
import { quickDrainRequest, quickLineRequest, quickSiphonRequest } from './quick-check';
import type { Verdict } from './verdict';
import { drainVerdict, lineVerdict, siphonVerdict } from './verdict';
import { cautionIdsFor } from '../cautions';
import type { UnitSystem } from '../hydraulics/units';
import { formatQuantity } from '../hydraulics/units';
import { crestPressureFigure, leadWithCrestWhenBroken, siphonFlowFigure } from './siphon-figures';

export interface Figure {
  id: string;
  label: string;
  kind: QuantityKind;
  si: number;
  /** Words shown instead of the number, when the number would mislead. */
  text?: string;
  note?: string;
}

/** A figure's value as shown: its words, "never" for an endless time, else number and unit. */
export function figureValue(f: Figure, system: UnitSystem): string {
  if (f.text) return f.text;
  return Number.isFinite(f.si) ? formatQuantity(f.kind, f.si, system) : 'never';
}

export interface QuickAnswer {
  verdict: Verdict;
  figures: Figure[];
  biggest: BiggestLoss | null;
  /** Siphon only: room at the crest before the working limit, m of water. */
  crestMarginM?: number;
  warnings: Warning[];
  cautions: string[];
  raw: SiphonResult | LineResult | DrainResult;
}

export interface QuickError {
  error: string;
}

/** Default water: 15 °C, as API v1. */
const RHO_15C = waterProperties(15).density_kg_m3;

function timeFigure(volumeM3: number, flowM3S: number): Figure {
  return {
    id: 'time',
    label: 'Time to move the water',
    kind: 'time',
    si: flowM3S > 0 ? volumeM3 / flowM3S : Infinity,
    note: 'at this flow; it slows as the source level falls',
  };
}

function siphonAnswer(s: QuickState, d: number, mat: string): QuickAnswer {
  const r = solveSiphon(quickSiphonRequest(s, d, mat));
  return {
    verdict: siphonVerdict(r),
    figures: leadWithCrestWhenBroken(r, [
      siphonFlowFigure(r),
      timeFigure(s.volume_m3, r.status === 'runs' || r.status === 'marginal' ? r.flow_m3_s : 0),
      crestPressureFigure(r),
      { id: 'priming', label: 'Water to prime the hose', kind: 'volume', si: r.priming_volume_m3 },
    ]),
    biggest: biggestLoss(r.losses_m),
    crestMarginM: r.status === 'no_flow' ? undefined : quickCrestMarginM(s, d, mat, RHO_15C),
    warnings: r.warnings,
    cautions: cautionIdsFor({ tool: 'siphon' }),
    raw: r,
  };
}

function lineAnswer(s: QuickState, d: number, mat: string): QuickAnswer {
  const r = solveLine(quickLineRequest(s, d, mat));
  return {
    verdict: lineVerdict(r),
    figures: [
      { id: 'flow', label: 'Flow', kind: 'flow', si: r.flow_m3_s },
      timeFigure(s.volume_m3, r.flow_m3_s),
      { id: 'velocity', label: 'Speed at the outlet', kind: 'velocity', si: r.velocity_m_s },
    ],
    biggest: biggestLoss(r.losses_m),
    warnings: r.warnings,
    cautions: cautionIdsFor({ tool: 'line' }),
    raw: r,
  };
}

function tankAnswer(s: QuickState, d: number, mat: string): QuickAnswer {
  const r = solveDrain(quickDrainRequest(s, d, mat));
  const hose = s.tank_outlet === 'hose';
  return {
    verdict: drainVerdict(r),
    figures: [
      { id: 'time', label: 'Time to drain', kind: 'time', si: r.status === 'no_flow' ? Infinity : r.time_s },
      { id: 'flow', label: 'Flow at the start', kind: 'flow', si: r.initial_flow_m3_s },
      { id: 'volume', label: 'Water in the tank', kind: 'volume', si: r.volume_initial_m3 },
      { id: 'left', label: 'Water left at the stop', kind: 'volume', si: r.volume_left_m3 },
    ],
    biggest: null,
    warnings: r.warnings,
    cautions: cautionIdsFor({ tool: 'drain', outlet: hose ? 'line' : 'orifice' }),
    raw: r,
  };
}

/** The answer for the quick check's inputs, or a message naming the input to fix. */
export function quickAnswer(s: QuickState): QuickAnswer | QuickError {
  const size = findSize(s.size);
  if (!size) return { error: 'Choose a hose size.' };
  try {
    if (s.mode === 'siphon') return siphonAnswer(s, size.inner_diameter_m, size.material);
    if (s.mode === 'line') return lineAnswer(s, size.inner_diameter_m, size.material);
    return tankAnswer(s, size.inner_diameter_m, size.material);
  } catch (e) {
    if (e instanceof EngineInputError) return { error: inputMessage(e) };
    throw e;
  }
}

const FIELD_NAMES: Record<string, string> = {
  'line.length_m': 'Hose length',
  'line.inner_diameter_m': 'Hose size',
  length_to_crest_m: 'Hose length',
  initial_depth_m: 'Water depth',
  'vessel.depth_m': 'Water depth',
  'vessel.length_m': 'Tank length',
  'vessel.width_m': 'Tank width',
  'vessel.diameter_m': 'Tank diameter',
  'outlet.diameter_m': 'Hole size',
};

function inputMessage(e: EngineInputError): string {
  const name = FIELD_NAMES[e.path] ?? e.path;
  return `${name} ${e.message}.`;
}
