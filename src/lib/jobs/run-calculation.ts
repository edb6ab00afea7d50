import { ENGINE_VERSION, EngineInputError, solveDrain, solveLine, solveSiphon } from '../hydraulics';
import type { DrainRequest, DrainResult, LineRequest, LineResult, SiphonRequest, SiphonResult } from '../hydraulics';
import { invalid } from './http';

export type Tool = 'line' | 'siphon' | 'drain';
export type EngineResult = LineResult | SiphonResult | DrainResult;

export interface EngineRun {
  results: EngineResult;
  engineVersion: string;
}

/** True when every number anywhere in the value is finite (the engine found an answer). */
function allFinite(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allFinite);
  if (v && typeof v === 'object') return Object.values(v).every(allFinite);
  return true;
}

function solve(tool: Tool, inputs: unknown): EngineResult {
  switch (tool) {
    case 'line':
      return solveLine(inputs as LineRequest);
    case 'siphon':
      return solveSiphon(inputs as SiphonRequest);
    case 'drain':
      return solveDrain(inputs as DrainRequest);
  }
}

/**
 * Run the current engine on saved or submitted inputs. This is the validation of a calculation:
 * inputs the engine cannot compute with are refused with the field it names, and the stored
 * results are always the engine's, never a client's.
 */
export function runCalculation(tool: Tool, inputs: unknown): EngineRun {
  let results: EngineResult;
  try {
    results = solve(tool, structuredClone(inputs));
  } catch (e) {
    if (e instanceof EngineInputError) throw invalid([{ path: `inputs.${e.path}`, message: e.message }]);
    throw invalid([{ path: 'inputs', message: `is not a ${tool} calculation the engine can run` }]);
  }
  if (!allFinite(results)) {
    throw invalid([{ path: 'inputs', message: 'gave no finite result; check the numbers' }]);
  }
  return { results, engineVersion: ENGINE_VERSION };
}
