/** What moved between a saved result and the same inputs on today's engine. */
export interface ResultChange {
  path: string;
  before: unknown;
  after: unknown;
  /** Relative change for numbers, (after − before) / |before|; null otherwise. */
  relative: number | null;
}

/** Relative tolerance under which two numbers count as the same (floating-point noise). */
const SAME = 1e-9;

function sameNumber(a: number, b: number): boolean {
  return a === b || Math.abs(a - b) <= SAME * Math.max(Math.abs(a), Math.abs(b));
}

function walk(path: string, a: unknown, b: unknown, out: ResultChange[]): void {
  if (typeof a === 'number' && typeof b === 'number') {
    if (!sameNumber(a, b)) out.push({ path, before: a, after: b, relative: a === 0 ? null : (b - a) / Math.abs(a) });
    return;
  }
  const isObj = (v: unknown): v is Record<string, unknown> => !!v && typeof v === 'object' && !Array.isArray(v);
  if (isObj(a) && isObj(b)) {
    for (const k of new Set([...Object.keys(a), ...Object.keys(b)])) walk(path ? `${path}.${k}` : k, a[k], b[k], out);
    return;
  }
  if (Array.isArray(a) && Array.isArray(b) && path === 'curve') {
    // A drain curve is reported as one change; its summary fields carry the numbers.
    const moved = a.length !== b.length || a.some((x, i) => diffResults(x, b[i]).length > 0);
    if (moved) out.push({ path, before: `${a.length} points`, after: `${b.length} points, moved`, relative: null });
    return;
  }
  if (JSON.stringify(a) !== JSON.stringify(b)) out.push({ path, before: a, after: b, relative: null });
}

/** Every field that differs, engine_version included when it changed. */
export function diffResults(before: unknown, after: unknown): ResultChange[] {
  const out: ResultChange[] = [];
  walk('', before, after, out);
  return out;
}
