import {
  ENGINE_VERSION,
  EngineInputError,
  solveDrain,
  solveLine,
  solveSiphon,
} from '../hydraulics';
import type { DrainRequest, LineRequest, SiphonRequest } from '../hydraulics';
import { diffResults } from './diff';
import type { FieldDiff } from './diff';
import type { FlagTool } from './labels';

export type Rerun =
  | { ok: true; engineVersion: string; results: unknown; diffs: FieldDiff[]; changed: number }
  | { ok: false; engineVersion: string; error: { path: string; message: string } };

/** Solve frozen inputs with today's engine. Inputs came from a browser, so they may be refused. */
export function solveFrozen(tool: FlagTool, inputs: unknown): unknown {
  if (tool === 'line') return solveLine(inputs as LineRequest);
  if (tool === 'siphon') return solveSiphon(inputs as SiphonRequest);
  return solveDrain(inputs as DrainRequest);
}

/** Re-run a snapshot on today's engine and compare field by field with what the reporter saw. */
export function rerunSnapshot(tool: FlagTool, inputs: unknown, frozenResults: unknown): Rerun {
  try {
    const results = solveFrozen(tool, inputs);
    const diffs = diffResults(frozenResults, results);
    const changed = diffs.filter((d) => d.change !== 'same').length;
    return { ok: true, engineVersion: ENGINE_VERSION, results, diffs, changed };
  } catch (err) {
    if (err instanceof EngineInputError) {
      return {
        ok: false,
        engineVersion: ENGINE_VERSION,
        error: { path: err.path, message: err.message },
      };
    }
    // Malformed frozen inputs (missing objects, wrong types) surface as TypeErrors in the engine.
    const message = err instanceof Error ? err.message : String(err);
    return { ok: false, engineVersion: ENGINE_VERSION, error: { path: '(inputs)', message } };
  }
}
