import type { ReactElement } from 'react';
import FlagResult from './FlagResult';
import SaveToJob from './SaveToJob';

/**
 * "Flag this result" and "Save to a job" under a full tool's result, both handed the engine
 * request the result on screen came from, so a saved or flagged result can be re-run exactly.
 */
export default function ResultActions(p: {
  tool: 'line' | 'siphon' | 'drain';
  inputs: object;
  results: object;
  unitSystem: 'metric' | 'us';
  /** The tool's path, e.g. /siphon, and its current share query (without "?"). */
  path: string;
  query: string;
}): ReactElement {
  const openPath = p.query ? `${p.path}?${p.query}` : p.path;
  return (
    <div className="flex flex-col gap-3">
      <FlagResult tool={p.tool} inputs={p.inputs} results={p.results} unitSystem={p.unitSystem} />
      <SaveToJob tool={p.tool} inputs={p.inputs} unitSystem={p.unitSystem} openPath={openPath} />
    </div>
  );
}
