/**
 * Field-by-field comparison of a frozen result with today's result for the same inputs. Results
 * are flattened to dotted paths; long arrays (a drain curve) are summarised by their length and
 * last point, and warning lists are compared by their codes.
 */

export type Scalar = string | number | boolean | null;

export interface FieldDiff {
  path: string;
  before: Scalar | undefined;
  after: Scalar | undefined;
  change: 'same' | 'changed' | 'added' | 'removed';
  /** (after − before) / |before| for numbers that moved, else null. */
  relative: number | null;
}

/** Two numbers closer than this, relative to the larger, count as the same (float noise). */
export const SAME_RELATIVE = 1e-9;

const LONG_ARRAY = 8;

function isCodeList(v: unknown[]): v is { code: string }[] {
  return v.every(
    (x) =>
      typeof x === 'object' && x !== null && typeof (x as { code?: unknown }).code === 'string',
  );
}

/** Flatten a JSON value to path → scalar. */
export function flatten(
  value: unknown,
  prefix = '',
  out = new Map<string, Scalar>(),
): Map<string, Scalar> {
  if (Array.isArray(value)) {
    if (isCodeList(value)) {
      out.set(
        prefix,
        value
          .map((w) => w.code)
          .sort()
          .join(', ') || '(none)',
      );
    } else if (value.length > LONG_ARRAY) {
      out.set(`${prefix}.length`, value.length);
      flatten(value[value.length - 1], `${prefix}[last]`, out);
    } else {
      value.forEach((v, i) => flatten(v, `${prefix}[${i}]`, out));
      if (value.length === 0) out.set(prefix, '(empty)');
    }
  } else if (typeof value === 'object' && value !== null) {
    for (const [k, v] of Object.entries(value)) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  } else if (['string', 'number', 'boolean'].includes(typeof value) || value === null) {
    out.set(prefix, value as Scalar);
  }
  return out;
}

function compare(before: Scalar, after: Scalar): Pick<FieldDiff, 'change' | 'relative'> {
  if (typeof before === 'number' && typeof after === 'number') {
    const scale = Math.max(Math.abs(before), Math.abs(after));
    if (scale === 0 || Math.abs(after - before) <= SAME_RELATIVE * scale) {
      return { change: 'same', relative: null };
    }
    return {
      change: 'changed',
      relative: before === 0 ? null : (after - before) / Math.abs(before),
    };
  }
  return { change: before === after ? 'same' : 'changed', relative: null };
}

/** Every field of either result, in the frozen result's order, then fields only today has. */
export function diffResults(before: unknown, after: unknown): FieldDiff[] {
  const a = flatten(before);
  const b = flatten(after);
  const rows: FieldDiff[] = [];
  for (const [path, v] of a) {
    if (!b.has(path))
      rows.push({ path, before: v, after: undefined, change: 'removed', relative: null });
    else rows.push({ path, before: v, after: b.get(path), ...compare(v, b.get(path)!) });
  }
  for (const [path, v] of b) {
    if (!a.has(path))
      rows.push({ path, before: undefined, after: v, change: 'added', relative: null });
  }
  return rows;
}
