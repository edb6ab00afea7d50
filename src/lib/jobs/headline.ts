/**
 * What a saved calculation came to, in a line: its verdict word and two or three figures, in the
 * units it was saved in, so a job's list of calculations reads without opening each one.
 */
import type { DrainResult, LineResult, SiphonResult } from '../hydraulics/types';
import type { UnitSystem } from '../hydraulics/units';
import { formatQuantity } from '../hydraulics/units';
import { drainVerdict, lineVerdict, siphonVerdict } from '../calculators/verdict';
import type { Verdict } from '../calculators/verdict';
import type { Figure } from '../calculators/quick-result';
import { drainFigures, lineFigures, siphonFigures } from '../calculators/result-figures';
import type { TOOL_NAMES } from './client-api';

export type SavedTool = keyof typeof TOOL_NAMES;

export interface Headline {
  verdict: Verdict | null;
  figures: { label: string; value: string }[];
}

/** Which of each tool's own result figures make its headline. */
const HEADLINE_IDS: Record<SavedTool, string[]> = {
  line: ['flow', 'velocity'],
  siphon: ['flow', 'crest-pressure'],
  drain: ['time', 'flow', 'drained'],
};
const TOOL_FIGURES: Record<SavedTool, (r: never) => Figure[]> = {
  line: lineFigures,
  siphon: siphonFigures,
  drain: drainFigures,
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
  const figures = TOOL_FIGURES[tool](results as never)
    .filter((f) => HEADLINE_IDS[tool].includes(f.id) && typeof f.si === 'number' && Number.isFinite(f.si))
    .map((f) => ({ label: f.label, value: formatQuantity(f.kind, f.si, system) }));
  return { verdict: verdictOf(tool, results), figures };
}
