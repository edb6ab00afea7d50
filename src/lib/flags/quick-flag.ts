import type { QuickState } from '../calculators/quick-check';
import {
  quickDrainRequest,
  quickLineRequest,
  quickSiphonRequest,
} from '../calculators/quick-check';
import type { QuickAnswer, QuickError } from '../calculators/quick-result';
import { findSize } from '../hydraulics';
import type { FlagTool } from './labels';

/** What FlagResult needs to freeze a quick-check result: the engine request and its result. */
export interface QuickFlag {
  tool: FlagTool;
  inputs: object;
  results: object;
}

/**
 * The engine request behind the quick check's answer, rebuilt from its inputs the same way
 * quickAnswer builds it, so support can re-run exactly what the crew saw. Null when there is no
 * result on screen.
 */
export function quickFlag(s: QuickState, answer: QuickAnswer | QuickError): QuickFlag | null {
  const size = findSize(s.size);
  if ('error' in answer || !size) return null;
  const d = size.inner_diameter_m;
  if (s.mode === 'siphon')
    return { tool: 'siphon', inputs: quickSiphonRequest(s, d, size.material), results: answer.raw };
  if (s.mode === 'line')
    return { tool: 'line', inputs: quickLineRequest(s, d, size.material), results: answer.raw };
  return { tool: 'drain', inputs: quickDrainRequest(s, d, size.material), results: answer.raw };
}
