/**
 * What a saved calculation came to, in a line: its verdict word and two or three figures, in the
 * units it was saved in, so a job's list of calculations reads without opening each one.
 */
import type { DrainResult, LineResult, SiphonResult } from '../hydraulics/types';
import type { QuantityKind, UnitSystem } from '../hydraulics/units';
import { formatQuantity } from '../hydraulics/units';
import { drainVerdict, lineVerdict, siphonVerdict } from '../calculators/verdict';
import type { Verdict } from '../calculators/verdict';
import type { TOOL_NAMES } from './client-api';

export type SavedTool = keyof typeof TOOL_NAMES;

export interface Headline {
  verdict: Verdict | null;
  figures: { label: string; value: string }[];
}

/** Each tool's figures: label, result field (SI) and its kind. */
const FIGURES: Record<SavedTool, [string, string, QuantityKind][]> = {
  line: [
    ['Flow', 'flow_m3_s', 'flow'],
    ['Speed in the line', 'velocity_m_s', 'velocity'],
  ],
  siphon: [
    ['Flow', 'flow_m3_s', 'flow'],
    ['Pressure at the crest', 'crest_pressure_abs_pa', 'pressure'],
  ],
  drain: [
    ['Time to the stop', 'time_s', 'time'],
    ['Flow at the start', 'initial_flow_m3_s', 'flow'],
    ['Water moved', 'volume_drained_m3', 'volume'],
  ],
};

function verdictOf(tool: SavedTool, results: Record<string, unknown>): Verdict | null {
  if (typeof results.status !== 'string') return null;
  if (tool === 'drain') return drainVerdict({ warnings: [], ...results } as unknown as DrainResult);
  if (tool === 'siphon') return siphonVerdict(results as unknown as SiphonResult);
  return lineVerdict(results as unknown as LineResult);
}

/** The headline of stored engine results; fields that are missing or not numbers are left out. */
export function headlineOf(
  tool: SavedTool,
  results: Record<string, unknown>,
  system: UnitSystem,
): Headline {
  const figures = FIGURES[tool].flatMap(([label, key, kind]) => {
    const v = results[key];
    return typeof v === 'number' && Number.isFinite(v)
      ? [{ label, value: formatQuantity(kind, v, system) }]
      : [];
  });
  return { verdict: verdictOf(tool, results), figures };
}
