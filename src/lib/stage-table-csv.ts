/**
 * Depth–area tables from CSV (typed or uploaded), parsed with papaparse and checked row by row
 * against API v1's rules: 2–1000 points, depth strictly increasing from 0, area > 0. Each problem
 * names its row as a spreadsheet shows it (row 1 is the first line of the file).
 */
import Papa from 'papaparse';
import type { UnitSystem } from './hydraulics/units';
import { fromDisplay, unitLabel } from './hydraulics/units';

export interface StagePointSI {
  depth_m: number;
  area_m2: number;
}

export interface StageCsvResult {
  points: StagePointSI[];
  errors: string[];
}

/** Most points API v1 accepts in a stage table. */
export const MAX_STAGE_POINTS = 1000;

/** Parse a number written with a point or a decimal comma; NaN when it is not one. */
function readNumber(cell: string | undefined): number {
  const t = (cell ?? '').trim().replace(/\s/g, '');
  if (!/^[-+]?(\d+([.,]\d*)?|[.,]\d+)([eE][-+]?\d+)?$/.test(t)) return NaN;
  return Number(t.replace(',', '.'));
}

const isHeader = (cells: string[]): boolean =>
  cells.length >= 2 && Number.isNaN(readNumber(cells[0])) && Number.isNaN(readNumber(cells[1]));

function checkRow(cells: string[], row: number, prev: StagePointSI | undefined, system: UnitSystem): StagePointSI | string {
  if (cells.length < 2) return `Row ${row}: needs two values, depth and area.`;
  const d = readNumber(cells[0]);
  const a = readNumber(cells[1]);
  if (Number.isNaN(d)) return `Row ${row}: depth “${cells[0]}” is not a number.`;
  if (Number.isNaN(a)) return `Row ${row}: area “${cells[1]}” is not a number.`;
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
export function parseStageCsv(text: string, system: UnitSystem): StageCsvResult {
  const parsed = Papa.parse<string[]>(text.trim(), { skipEmptyLines: 'greedy', delimitersToGuess: [',', ';', '\t', '|'] });
  const rows = parsed.data.map((r) => r.map((c) => String(c)));
  const errors: string[] = [];
  const points: StagePointSI[] = [];
  rows.forEach((cells, i) => {
    if (i === 0 && isHeader(cells)) return;
    const r = checkRow(cells, i + 1, points[points.length - 1], system);
    if (typeof r === 'string') errors.push(r);
    else points.push(r);
  });
  if (errors.length === 0 && points.length < 2) errors.push('The table needs at least two rows: the bottom (depth 0) and one above it.');
  if (points.length > MAX_STAGE_POINTS) errors.push(`The table has ${points.length} rows; the most is ${MAX_STAGE_POINTS}.`);
  return { points: errors.length ? [] : points, errors };
}

/** The table as CSV text in the crew's units, with a header naming them. */
export function stageCsvText(points: StagePointSI[], system: UnitSystem): string {
  const head = `depth (${unitLabel('length', system)}),area (${unitLabel('area', system)})`;
  const body = points.map((p) => {
    const d = p.depth_m / fromDisplay('length', 1, system);
    const a = p.area_m2 / fromDisplay('area', 1, system);
    return `${Number(d.toPrecision(6))},${Number(a.toPrecision(6))}`;
  });
  return [head, ...body].join('\n');
}
