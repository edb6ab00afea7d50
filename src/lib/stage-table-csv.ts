/**
 * Depth–area tables from CSV (typed or uploaded), parsed with papaparse and checked row by row
 * against API v1's rules: 2–1000 points, depth strictly increasing from 0, area > 0. Each problem
 * names its row as a spreadsheet shows it (row 1 is the first line of the file). Numbers are read
 * by the crew's locale (number-text.ts), so a quoted "1,000" from an English spreadsheet is a
 * thousand; a file that is not text at all gets one message and changes nothing.
 */
import Papa from 'papaparse';
import type { UnitSystem } from './hydraulics/units';
import { fromDisplay, unitLabel } from './hydraulics/units';
import { readNumberText, separatorsFor, writeNumberText } from './number-text';

export interface StagePointSI {
  depth_m: number;
  area_m2: number;
}

export interface StageCsvResult {
  points: StagePointSI[];
  errors: string[];
  /** True when the text is not a text file at all (binary bytes): keep what was there. */
  notText?: boolean;
}

/** Most points API v1 accepts in a stage table. */
export const MAX_STAGE_POINTS = 1000;

/** Row problems listed one by one; past this many the rest are counted. */
const MAX_LISTED = 5;

/** NUL, other C0 controls than tab/CR/LF, or undecodable bytes: no spreadsheet writes these. */
const NOT_TEXT = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffd]/;

const isHeader = (cells: string[], locale?: string): boolean =>
  cells.length >= 2 && !readNumberText(cells[0]!, locale).ok && !readNumberText(cells[1]!, locale).ok;

/** A cell's number, or the problem named with its row and column. */
function cellValue(cells: string[], i: number, row: number, locale?: string): number | string {
  const r = readNumberText(cells[i]!, locale);
  if (r.ok) return r.value;
  const what = i === 0 ? 'depth' : 'area';
  return `Row ${row}: ${what} “${cells[i]!.trim()}” is not a number (${r.problem.charAt(0).toLowerCase()}${r.problem.slice(1)}).`;
}

function checkRow(
  cells: string[],
  row: number,
  prev: StagePointSI | undefined,
  system: UnitSystem,
  locale?: string,
): StagePointSI | string {
  if (cells.length < 2) return `Row ${row}: needs two values, depth and area.`;
  if (cells.slice(2).some((c) => c.trim() !== ''))
    return `Row ${row}: has more than two values; put a number with a thousands separator in quotes, or leave the separator out.`;
  const d = cellValue(cells, 0, row, locale);
  if (typeof d === 'string') return d;
  const a = cellValue(cells, 1, row, locale);
  if (typeof a === 'string') return a;
  const point = { depth_m: fromDisplay('length', d, system), area_m2: fromDisplay('area', a, system) };
  if (!prev && d !== 0) return `Row ${row}: the first depth must be 0 (the bottom), not ${cells[0]}.`;
  if (prev && point.depth_m <= prev.depth_m)
    return `Row ${row}: depth ${cells[0]} ${unitLabel('length', system)} must be greater than the row above.`;
  if (!(a > 0)) return `Row ${row}: area must be greater than 0.`;
  return point;
}

/**
 * Read a depth–area table: two columns, depth then area, in the crew's units (m and m², or ft
 * and ft²), comma, semicolon or tab separated, with an optional header row. Empty lines are
 * skipped. Returns the points in SI and every problem found.
 */
export function parseStageCsv(text: string, system: UnitSystem, locale?: string): StageCsvResult {
  if (NOT_TEXT.test(text))
    return { points: [], errors: ['This is not a CSV text file, so nothing was read from it.'], notText: true };
  const parsed = Papa.parse<string[]>(text.trim(), { skipEmptyLines: 'greedy', delimitersToGuess: [',', ';', '\t', '|'] });
  const rows = parsed.data.map((r) => r.map((c) => String(c)));
  const errors: string[] = [];
  const points: StagePointSI[] = [];
  rows.forEach((cells, i) => {
    if (i === 0 && isHeader(cells, locale)) return;
    const r = checkRow(cells, i + 1, points[points.length - 1], system, locale);
    if (typeof r === 'string') errors.push(r);
    else points.push(r);
  });
  if (errors.length === 0 && points.length < 2) errors.push('The table needs at least two rows: the bottom (depth 0) and one above it.');
  if (points.length > MAX_STAGE_POINTS) errors.push(`The table has ${points.length} rows; the most is ${MAX_STAGE_POINTS}.`);
  const listed = errors.length > MAX_LISTED + 1 ? [...errors.slice(0, MAX_LISTED), `…and ${errors.length - MAX_LISTED} more rows with problems.`] : errors;
  return { points: errors.length ? [] : points, errors: listed };
}

/**
 * The table as CSV text in the crew's units and locale, with a header naming the units. Where
 * the locale's decimal mark is a comma the columns are split by semicolons.
 */
export function stageCsvText(points: StagePointSI[], system: UnitSystem, locale?: string): string {
  const sep = separatorsFor(locale).decimal === ',' ? ';' : ',';
  const head = `depth (${unitLabel('length', system)})${sep}area (${unitLabel('area', system)})`;
  const body = points.map((p) => {
    const d = p.depth_m / fromDisplay('length', 1, system);
    const a = p.area_m2 / fromDisplay('area', 1, system);
    return `${writeNumberText(d, locale)}${sep}${writeNumberText(a, locale)}`;
  });
  return [head, ...body].join('\n');
}
