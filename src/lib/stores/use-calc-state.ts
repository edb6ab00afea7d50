/**
 * Calculator state for an island: starts at the defaults (so the server's HTML and the first
 * client render agree), then takes the inputs from the page's query string, and keeps the query
 * string up to date so the address bar is always a link to the result on screen.
 */
import { useStore } from '@nanostores/react';
import { startTransition, useCallback, useEffect, useState } from 'react';
import type { UnitSystem } from '../hydraulics/units';
import type { ShareRow, ShareState } from '../share-url';
import { decodeShare, shareQuery, startOf } from '../share-url';
import { $unitSystem } from './unit-system';

/** True after the first client render (a low-priority update, so hydration is not held up). */
export function useHydrated(): boolean {
  const [ready, setReady] = useState(false);
  useEffect(() => startTransition(() => setReady(true)), []);
  return ready;
}

/** The crew's unit system; metric until hydrated, so server and client markup match. */
export function useUnitSystem(): UnitSystem {
  const stored = useStore($unitSystem);
  return useHydrated() ? stored : 'metric';
}

export interface CalcState<T extends ShareState> {
  state: T;
  /** Change some inputs. */
  update: (patch: Partial<T>) => void;
  /** Query string of the current inputs (no leading '?'). */
  query: string;
}

/**
 * `settled` is false while the tool is still switching units part by part (use-staged-units.ts);
 * the page is marked ready only once it is not. `usStart` changes `defaults` into a US crew's
 * starting values; which start a page opens on follows share-url.ts.
 */
export function useCalcState<T extends ShareState>(
  defaults: T,
  rowTemplates: Record<string, ShareRow> = {},
  settled = true,
  usStart: Partial<T> = {},
): CalcState<T> {
  const [start, setStart] = useState<UnitSystem>('metric');
  const [state, setState] = useState<T>(defaults);
  const [loaded, setLoaded] = useState(false);
  const startValues = (system: UnitSystem): T => (system === 'us' ? { ...defaults, ...usStart } : defaults);
  useEffect(() => {
    const search = window.location.search;
    const from = startOf(search, $unitSystem.get());
    // a transition: applying a shared link's inputs should not block the main thread at load
    startTransition(() => {
      setStart(from);
      if (search || from === 'us') {
        setState(decodeShare(search, startValues(from), rowTemplates));
      }
      setLoaded(true);
    });
    // defaults and starts are module constants; read the URL once
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
  const rowKeys = Object.fromEntries(
    Object.entries(rowTemplates).map(([k, t]) => [k, Object.keys(t)]),
  );
  const query = shareQuery(state, start, startValues(start), rowKeys);
  useEffect(() => {
    if (!loaded) return;
    const url = `${window.location.pathname}?${query}${window.location.hash}`;
    window.history.replaceState(window.history.state, '', url);
  }, [query, loaded]);
  useEffect(() => {
    // runs after the commit that shows the link's inputs in the crew's units: tells tests and
    // scripts they are applied
    if (loaded && settled) document.documentElement.dataset.calcReady = '1';
  }, [loaded, settled]);
  const update = useCallback((patch: Partial<T>) => setState((s) => ({ ...s, ...patch })), []);
  return { state, update, query };
}
