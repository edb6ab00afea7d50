/**
 * The page side of drain-hints.worker.ts: one shared worker per page and one job in it at a
 * time. Jobs asked for meanwhile wait here, and those cancelled while waiting (inputs changed
 * again while typing) are never sent, so the latest inputs' reply is not held up behind stale
 * ones. Where a worker cannot start or fails to load (an old browser, a script blocked or
 * missing offline), the hints are worked out on the main thread in a later task instead.
 */
import type { DrainHintsJob } from './drain-hints';
import type { Hint } from './hints';

interface Pending {
  job: DrainHintsJob;
  live: () => boolean;
  reply: (hints: Hint[]) => void;
}

let worker: Worker | null | undefined;
let inFlight: Pending | null = null;
const waiting: Pending[] = [];

/** The fallback, its solvers fetched only when it is needed. */
function onMainThread({ job, reply }: Pending): void {
  import('./drain-hints').then(
    ({ hintsForJob }) => reply(hintsForJob(job)),
    () => reply([]),
  );
}

function sendNext(w: Worker): void {
  while (!inFlight && waiting.length > 0) {
    const next = waiting.shift()!;
    if (!next.live()) continue;
    inFlight = next;
    w.postMessage(next.job);
  }
}

/** The worker failed: everything still waiting on it is worked out here instead. */
function giveUpOnWorker(): void {
  worker?.terminate();
  worker = null;
  const left = [...(inFlight ? [inFlight] : []), ...waiting];
  inFlight = null;
  waiting.length = 0;
  left.forEach(onMainThread);
}

function hintsWorker(): Worker | null {
  if (worker !== undefined) return worker;
  try {
    const w = new Worker(new URL('./drain-hints.worker.ts', import.meta.url), { type: 'module' });
    w.onmessage = (e: MessageEvent<Hint[]>) => {
      const done = inFlight;
      inFlight = null;
      done?.reply(e.data);
      sendNext(w);
    };
    w.onerror = giveUpOnWorker;
    worker = w;
  } catch {
    worker = null;
  }
  return worker;
}

/**
 * Ask for the hints of one solved drain-down; `onHints` gets them once, unless the returned
 * cancel function is called first (the inputs changed and a newer job is on its way).
 */
export function requestDrainHints(
  job: DrainHintsJob,
  onHints: (hints: Hint[]) => void,
): () => void {
  let live = true;
  const entry: Pending = { job, live: () => live, reply: (hints) => live && onHints(hints) };
  const w = hintsWorker();
  if (w) {
    waiting.push(entry);
    sendNext(w);
  } else onMainThread(entry);
  return () => {
    live = false;
  };
}
