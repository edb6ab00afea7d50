/**
 * Numbers as a crew types them, read by the rules of their locale. The locale's decimal and group
 * separators come from Intl (CLDR data). A point is a decimal point in every locale, spaces group
 * digits in every locale, and group separators count only between groups of three digits. An
 * entry that could be read two ways, or that breaks these rules, is refused with a message; it
 * is never guessed.
 */

export interface Separators {
  decimal: string;
  group: string;
}

export type NumberRead =
  { ok: true; value: number } | { ok: false; empty: boolean; problem: string };

const SPACES = /[\s\u00a0\u202f]/;
const APOSTROPHES = /['\u2019]/;

/** One class per separator: every space is one, both apostrophes are one. */
const classOf = (ch: string): string => (SPACES.test(ch) ? ' ' : APOSTROPHES.test(ch) ? "'" : ch);

/** The locale's decimal and group separators (en-US "." and ","; de-DE "," and "."). */
export function separatorsFor(locale?: string): Separators {
  let parts: Intl.NumberFormatPart[];
  try {
    parts = new Intl.NumberFormat(locale, { useGrouping: true }).formatToParts(1234567.5);
  } catch {
    parts = new Intl.NumberFormat('en-US', { useGrouping: true }).formatToParts(1234567.5);
  }
  const decimal = parts.find((p) => p.type === 'decimal')?.value ?? '.';
  const group = parts.find((p) => p.type === 'group')?.value ?? ',';
  return { decimal, group };
}

/** A value as input text: up to 6 significant figures, the locale's decimal mark, no grouping. */
export function writeNumberText(value: number, locale?: string): string {
  if (!Number.isFinite(value)) return '';
  const plain = String(Number(value.toPrecision(6)));
  return plain.replace('.', separatorsFor(locale).decimal);
}

/** Digit runs split by single separator characters: "1,234.5" → 1 , 234 . 5; null for "1,,2". */
function tokens(body: string): { runs: string[]; seps: string[] } | null {
  const runs: string[] = [];
  const seps: string[] = [];
  for (const piece of body.split(/(\D)/)) {
    if (/^\d*$/.test(piece)) runs.push(piece);
    else seps.push(classOf(piece));
  }
  // only the first run (".5") and the last ("2." while typing) may be empty
  return runs.slice(1, -1).every((r) => r !== '') ? { runs, seps } : null;
}

/** Groups of three after a lead of one to three digits: "1,234,567". */
const groupsValid = (runs: string[]): boolean =>
  runs.length > 0 && /^\d{1,3}$/.test(runs[0]!) && runs.slice(1).every((r) => r.length === 3);

/** Plain digits when every separator groups digits; null when they cannot all be groups. */
function asGrouped(runs: string[], seps: string[], groupable: Set<string>): string | null {
  if (seps.length === 0) return runs[0]!;
  if (!seps.every((s) => s === seps[0] && groupable.has(s)) || !groupsValid(runs)) return null;
  return runs.join('');
}

/** "123.45" when the last separator is the decimal mark and any before it group digits. */
function asDecimal(
  runs: string[],
  seps: string[],
  decimals: Set<string>,
  groupable: Set<string>,
): string | null {
  const mark = seps[seps.length - 1];
  if (mark === undefined || !decimals.has(mark)) return null;
  const whole = runs.slice(0, -1);
  const groups = seps.slice(0, -1);
  const groupsOk =
    groups.every((s) => s === groups[0] && s !== mark && groupable.has(s)) && groupsValid(whole);
  if (groups.length > 0 && !groupsOk) return null;
  return `${whole.join('') || '0'}.${runs[runs.length - 1] || '0'}`;
}

const NAMES: Record<string, string> = {
  '.': 'a point',
  ',': 'a comma',
  ' ': 'a space',
  "'": 'an apostrophe',
};
const nameOf = (ch: string): string => NAMES[classOf(ch)] ?? `“${ch}”`;

/** Why an entry made only of digits and separators is still not one number. */
function problemFor(
  body: string,
  seps: Separators,
  groupable: Set<string>,
  decimals: Set<string>,
): string {
  const example = `1${seps.group}500${seps.decimal}5`;
  const groupOnly = (c: string): boolean => groupable.has(classOf(c)) && !decimals.has(classOf(c));
  const lastSep = [...body].reverse().find((c) => /\D/.test(c));
  if (lastSep && groupOnly(lastSep) && /(^|\D)(\d{1,2}|\d{4,})$/.test(body)) {
    const marks = [...decimals].map(nameOf).join(' or ');
    return `Use ${marks} for decimals; here ${nameOf(lastSep)} groups thousands, as in ${example}`;
  }
  if ([...body].some(groupOnly))
    return `Group thousands in threes, as in ${example}, or leave the separator out`;
  return `Type one number, like 2${seps.decimal}5`;
}

/** Read digits and separators (no sign, no exponent) into a plain decimal string. */
function readBody(
  body: string,
  seps: Separators,
): { ok: true; digits: string } | { ok: false; problem: string } {
  const decimals = new Set(['.', classOf(seps.decimal)]);
  const groupable = new Set([' ', classOf(seps.group)]);
  const known = (c: string): boolean =>
    /\d/.test(c) || decimals.has(classOf(c)) || groupable.has(classOf(c));
  const t = [...body].every(known) ? tokens(body) : null;
  if (!t || !/\d/.test(body))
    return { ok: false, problem: `Type a number, like 2${seps.decimal}5` };
  const grouped = asGrouped(t.runs, t.seps, groupable);
  const decimal = asDecimal(t.runs, t.seps, decimals, groupable);
  if (grouped !== null && decimal !== null && Number(grouped) !== Number(decimal)) {
    const a = String(Number(decimal)).replace('.', seps.decimal);
    return {
      ok: false,
      problem: `Could be ${a} or ${Number(grouped)}: type it without a thousands separator`,
    };
  }
  const digits = grouped ?? decimal;
  return digits !== null
    ? { ok: true, digits }
    : { ok: false, problem: problemFor(body, seps, groupable, decimals) };
}

/**
 * Read typed text as a number in `locale` (BCP 47; the runtime's own when omitted).
 * Accepts a sign (- + or −), grouping, a decimal mark and an exponent ("1e9", "2.5E-3").
 */
export function readNumberText(text: string, locale?: string): NumberRead {
  const seps = separatorsFor(locale);
  const t = text.trim().replace(/^\u2212/, '-');
  if (t === '') return { ok: false, empty: true, problem: 'Type a number' };
  const m = /^([-+]?)(.*?)(?:[eE]([-+]?\d+))?$/.exec(t)!;
  const body = readBody(m[2]!, seps);
  if (!body.ok) return { ok: false, empty: false, problem: body.problem };
  const value = Number(`${m[1]}${body.digits}${m[3] ? `e${m[3]}` : ''}`);
  return Number.isFinite(value)
    ? { ok: true, value }
    : { ok: false, empty: false, problem: `Type a number, like 2${seps.decimal}5` };
}
