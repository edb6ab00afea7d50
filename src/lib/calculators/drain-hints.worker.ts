/**
 * The drain-down's "what would help" off the page's main thread. The inverse solvers re-run the
 * drain-down several times over (more outlets, the next size up, the smallest size for the time);
 * here they cost the page no blocking time and typing stays quick. One job in, one reply out.
 */
import type { DrainHintsJob } from './drain-hints';
import { hintsForJob } from './drain-hints';
import type { Hint } from './hints';

const scope = self as unknown as {
  onmessage: ((e: MessageEvent<DrainHintsJob>) => void) | null;
  postMessage: (hints: Hint[]) => void;
};

scope.onmessage = (e) => scope.postMessage(hintsForJob(e.data));
