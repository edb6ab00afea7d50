import { describe, expect, test } from 'vitest';
import { parseStageCsv, stageCsvText } from '../../../src/lib/stage-table-csv';

describe('stage-table-csv', () => {
  test('does read a table with a header, semicolons and decimal commas', () => {
    const r = parseStageCsv('depth;area\n0;10\n0,5;12,5\n1;16\n', 'metric');
    expect(r.errors).toEqual([]);
    expect(r.points).toEqual([
      { depth_m: 0, area_m2: 10 },
      { depth_m: 0.5, area_m2: 12.5 },
      { depth_m: 1, area_m2: 16 },
    ]);
  });

  test('does convert US units by the exact NIST factors (1 ft = 0.3048 m)', () => {
    const r = parseStageCsv('0,100\n2,150\n', 'us');
    expect(r.points[1]!.depth_m).toBe(2 * 0.3048);
    expect(r.points[1]!.area_m2).toBeCloseTo(150 * 0.3048 ** 2, 12);
  });

  test('does name the row of each problem', () => {
    const r = parseStageCsv('depth,area\n0.2,10\n0.4,x\n0.3,12\n0.5,0\n0.6\n', 'metric');
    expect(r.points).toEqual([]);
    expect(r.errors).toEqual([
      expect.stringMatching(/^Row 2: the first depth must be 0/),
      expect.stringMatching(/^Row 3: area “x” is not a number/),
      expect.stringMatching(/^Row 4: .*first depth must be 0/),
      expect.stringMatching(/^Row 5: .*first depth must be 0/),
      expect.stringMatching(/^Row 6: needs two values/),
    ]);
  });

  test('does write back what it reads', () => {
    const pts = [
      { depth_m: 0, area_m2: 3 },
      { depth_m: 1.25, area_m2: 4.5 },
    ];
    expect(parseStageCsv(stageCsvText(pts, 'metric'), 'metric').points).toEqual(pts);
  });
});
