/**
 * Zod issues turned into the API's error issues: one per problem, each with the dotted path of
 * its field and a message that starts with that path, in plain words.
 */
import type { z } from 'zod';
import type { ApiIssue } from './schemas-responses';

type Path = readonly PropertyKey[];
type RawIssue = z.core.$ZodIssue;

/** "line.fittings.0.id" from ['line', 'fittings', 0, 'id']. */
export function dottedPath(path: Path): string {
  return path.map((p) => String(p)).join('.');
}

/** A message that names its field: "line.length_m must be …" or "line: give …". */
export function issueAt(path: string, message: string): ApiIssue {
  if (!path) return { path, message: message.charAt(0).toUpperCase() + message.slice(1) };
  const joined = /^(must|is|are) /.test(message) ? `${path} ${message}` : `${path}: ${message}`;
  return { path, message: joined };
}

function valueAt(data: unknown, path: Path): unknown {
  let v = data;
  for (const key of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[key];
  }
  return v;
}

const list = (values: readonly unknown[]): string =>
  values.map((v) => (typeof v === 'string' ? v : JSON.stringify(v))).join(', ');

function typeMessage(expected: string, value: unknown): string {
  if (value === undefined) return 'is required';
  if (expected === 'int') return 'must be a whole number';
  if (typeof value === 'number' && expected === 'number') return 'must be a finite number';
  const got = value === null ? 'null' : Array.isArray(value) ? 'a list' : typeof value;
  const want =
    expected === 'array' ? 'a list' : expected === 'object' ? 'an object' : `a ${expected}`;
  return `must be ${want} (got ${got})`;
}

function boundMessage(iss: RawIssue & { code: 'too_small' | 'too_big' }): string {
  const small = iss.code === 'too_small';
  const bound = String(small ? iss.minimum : iss.maximum);
  if (iss.origin === 'array') return `must have ${small ? 'at least' : 'at most'} ${bound} rows`;
  if (iss.inclusive) return `must be ${small ? 'at least' : 'at most'} ${bound}`;
  return `must be ${small ? 'greater' : 'less'} than ${bound}`;
}

/** The union branch that came closest (fewest issues); a tie means neither fits better. */
function closestBranch(branches: RawIssue[][]): RawIssue[] | undefined {
  const sorted = [...branches].sort((a, b) => a.length - b.length);
  if (sorted.length === 0 || (sorted.length > 1 && sorted[0].length === sorted[1].length)) {
    return undefined;
  }
  return sorted[0];
}

/** Fields of one union branch (all required in API v1's unions): missing ones plus known given ones. */
function branchFields(branch: RawIssue[], value: object): string[] {
  const unknown = new Set(branch.flatMap((i) => (i.code === 'unrecognized_keys' ? i.keys : [])));
  const missing = branch
    .filter(
      (i) => i.code === 'invalid_type' && i.path.length === 1 && !(String(i.path[0]) in value),
    )
    .map((i) => String(i.path[0]));
  return [...Object.keys(value).filter((k) => !unknown.has(k)), ...missing];
}

/** True when a branch's issues say only "wrong fields" (unknown or missing), not "bad value". */
function onlyFieldProblems(branch: RawIssue[], value: object): boolean {
  return branch.every(
    (i) =>
      i.code === 'unrecognized_keys' ||
      (i.code === 'invalid_type' && i.path.length === 1 && !(String(i.path[0]) in value)),
  );
}

function formsMessage(branches: RawIssue[][], value: object): string {
  const forms = branches.map((b) => {
    const f = branchFields(b, value);
    return f.length > 1 ? `${f.slice(0, -1).join(', ')} and ${f[f.length - 1]}` : f.join('');
  });
  return `must have either ${forms.join(', or ')} (one form, not a mix)`;
}

function unionIssues(
  iss: RawIssue & { code: 'invalid_union' },
  data: unknown,
  base: Path,
): ApiIssue[] {
  const path = dottedPath(base);
  const options = (iss as { options?: readonly unknown[] }).options;
  if (options) {
    const rule = `must be one of: ${list(options)}`;
    return [issueAt(path, valueAt(data, base) === undefined ? `is required and ${rule}` : rule)];
  }
  const value = valueAt(data, base);
  if (value === null || typeof value !== 'object' || Array.isArray(value)) {
    return [issueAt(path, typeMessage('object', value))];
  }
  const branches = iss.errors as RawIssue[][];
  const best = closestBranch(branches);
  if (!best || onlyFieldProblems(best, value))
    return [issueAt(path, formsMessage(branches, value))];
  return best.flatMap((inner) => toApiIssues([inner], data, base));
}

/** Convert zod issues (paths relative to base inside data) to API issues. */
export function toApiIssues(
  issues: readonly RawIssue[],
  data: unknown,
  base: Path = [],
): ApiIssue[] {
  return issues.flatMap((iss): ApiIssue[] => {
    const full = [...base, ...iss.path];
    const path = dottedPath(full);
    switch (iss.code) {
      case 'invalid_type':
        return [issueAt(path, typeMessage(iss.expected, valueAt(data, full)))];
      case 'too_small':
      case 'too_big':
        return [issueAt(path, boundMessage(iss))];
      case 'invalid_value':
        return [issueAt(path, `must be one of: ${list(iss.values)}`)];
      case 'unrecognized_keys':
        return iss.keys.map((k) => issueAt(dottedPath([...full, k]), 'is not a known field'));
      case 'invalid_union':
        return unionIssues(iss, data, full);
      default:
        return [issueAt(path, 'is not valid')];
    }
  });
}
