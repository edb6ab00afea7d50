/**
 * The drain-down's "what would help" off the page's main thread. The inverse solvers re-run the
 * drain-down several times over (more outlets, the next size up, the smallest size for the time);
 * here they cost the page no blocking time and typing stays quick. One job in, one reply out.
 */
import { drainHints } from './drain-hints';
import type { DrainHintsJob, DrainHintsReply } from './drain-hints-client';

const scope = self as unknown as {
  onmessage: ((e: MessageEvent<DrainHintsJob>) => void) | null;
  postMessage: (reply: DrainHintsReply) => void;
};

scope.onmessage = (e) => {
  const { id, req, r, size, target, system } = e.data;
  try {
    scope.postMessage({ id, hints: drainHints(req, r, size, target, system) });
  } catch {
    // hints are extras: a job the solvers cannot take gets none, the result still stands
    scope.postMessage({ id, hints: [] });
  }
};
