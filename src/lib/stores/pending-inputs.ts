/**
 * Boxes whose text is not (yet) a value the tool accepts: empty, unreadable or out of range.
 * While any is, the result on screen is still the one for the last accepted inputs, so the tool
 * says so instead of letting it pass for the answer to what the boxes now show.
 */
import { createContext, useCallback, useContext, useEffect, useId, useMemo, useState } from 'react';

export interface PendingInputs {
  /** Mark one box (by its own id) as pending or settled. */
  report: (id: string, pending: boolean) => void;
}

const PendingContext = createContext<PendingInputs | null>(null);

/** Provides the tracker to the boxes below it (ToolLayout, the quick check). */
export const PendingInputsProvider = PendingContext.Provider;

/** The tracker for one tool, and how many of its boxes are pending. */
export function usePendingInputs(): { count: number; tracker: PendingInputs } {
  const [ids, setIds] = useState<ReadonlySet<string>>(() => new Set());
  const report = useCallback((id: string, pending: boolean) => {
    setIds((prev) => {
      if (prev.has(id) === pending) return prev;
      const next = new Set(prev);
      if (pending) next.add(id);
      else next.delete(id);
      return next;
    });
  }, []);
  const tracker = useMemo(() => ({ report }), [report]);
  return { count: ids.size, tracker };
}

/** Report this box as pending while `pending` is true; a removed box counts as settled. */
export function useReportPending(pending: boolean): void {
  const tracker = useContext(PendingContext);
  const id = useId();
  useEffect(() => {
    tracker?.report(id, pending);
  }, [tracker, id, pending]);
  useEffect(() => () => tracker?.report(id, false), [tracker, id]);
}
