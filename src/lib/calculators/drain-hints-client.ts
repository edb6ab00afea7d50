/**
 * The page side of drain-hints.worker.ts: one shared worker per page, jobs matched to replies by
 * id. Where a worker cannot start or fails to load (an old browser, a script blocked or missing
 * offline), the hints are worked out on the main thread in a later task instead.
 */
import type { DrainRequest, DrainResult, UnitSystem } from '../hydraulics';
import type { Hint } from './hints';

export interface DrainHintsJob {
  id: number;
  req: DrainRequest;
  r: DrainResult;
  size: string;
  target: number;
  system: UnitSystem;
}
export interface DrainHintsReply {
  id: number;
  hints: Hint[];
}

type Pending = { job: DrainHintsJob; reply: (hints: Hint[]) => void };

let worker: Worker | null | undefined;
let nextId = 1;
const pending = new Map<number, Pending>();

/** The fallback, its solvers fetched only when it is needed. */
function onMainThread({ job, reply }: Pending): void {
  import('./drain-hints').then(
    ({ drainHints }) => {
      let hints: Hint[] = [];
      try {
        hints = drainHints(job.req, job.r, job.size, job.target, job.system);
      } catch {
        // as in the worker: no hints for a job the solvers cannot take
      }
      reply(hints);
    },
    () => reply([]),
  );
}

/** The worker failed: everything still waiting on it is worked out here instead. */
function giveUpOnWorker(): void {
  worker?.terminate();
  worker = null;
  const waiting = [...pending.values()];
  pending.clear();
  waiting.forEach(onMainThread);
}

function hintsWorker(): Worker | null {
  if (worker !== undefined) return worker;
  try {
    worker = new Worker(new URL('./drain-hints.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (e: MessageEvent<DrainHintsReply>) => {
      const job = pending.get(e.data.id);
      pending.delete(e.data.id);
      job?.reply(e.data.hints);
    };
    worker.onerror = giveUpOnWorker;
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
  job: Omit<DrainHintsJob, 'id'>,
  onHints: (hints: Hint[]) => void,
): () => void {
  let live = true;
  const entry: Pending = {
    job: { ...job, id: nextId++ },
    reply: (hints) => live && onHints(hints),
  };
  const w = hintsWorker();
  if (w) {
    pending.set(entry.job.id, entry);
    w.postMessage(entry.job);
  } else onMainThread(entry);
  return () => {
    live = false;
  };
}
