import { describe, expect, test } from 'vitest';
import { parseStageCsv, stageCsvText } from '../../../src/lib/stage-table-csv';

describe('stage-table-csv', () => {
  test('does read a table with a header, semicolons and decimal commas', () => {
    // de-DE marks decimals with a comma (CLDR, via Intl)
    const r = parseStageCsv('depth;area\n0;10\n0,5;12,5\n1;16\n', 'metric', 'de-DE');
    expect(r.errors).toEqual([]);
    expect(r.points).toEqual([
      { depth_m: 0, area_m2: 10 },
      { depth_m: 0.5, area_m2: 12.5 },
      { depth_m: 1, area_m2: 16 },
    ]);
  });

  test('does convert US units by the exact NIST factors (1 ft = 0.3048 m)', () => {
    const r = parseStageCsv('0,100\n2,150\n', 'us', 'en-US');
    expect(r.points[1]!.depth_m).toBe(2 * 0.3048);
    expect(r.points[1]!.area_m2).toBeCloseTo(150 * 0.3048 ** 2, 12);
  });

  test('does name the row of each problem', () => {
    const r = parseStageCsv('depth,area\n0.2,10\n0.4,x\n0.3,12\n0.5,0\n0.6\n', 'metric', 'en-GB');
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
    for (const locale of ['en-US', 'de-DE', 'fr-FR'])
      expect(parseStageCsv(stageCsvText(pts, 'metric', locale), 'metric', locale).points).toEqual(pts);
  });

  // A spreadsheet in an English locale exports formatted numbers quoted: "1,000" is a thousand
  // (CLDR: the comma groups thousands in en-US). Expected volume 2 ft × mean(1000, 1500) ft².
  test('does read quoted thousands as thousands in en-US', () => {
    const r = parseStageCsv('depth (ft),area (ft²)\n0,"1,000"\n2,"1,500"\n4,"2,000"\n', 'us', 'en-US');
    expect(r.errors).toEqual([]);
    expect(r.points.map((p) => p.area_m2)).toEqual([1000, 1500, 2000].map((a) => a * 0.3048 ** 2));
  });

  test('does name the row when thousands are not quoted, instead of reading 1', () => {
    const r = parseStageCsv('0,1,000\n2,1,500\n', 'us', 'en-US');
    expect(r.points).toEqual([]);
    expect(r.errors[0]).toMatch(/^Row 1: has more than two values; put a number with a thousands separator in quotes/);
  });

  test('does refuse an ambiguous decimal comma in en-GB with the row named', () => {
    const r = parseStageCsv('0;10\n0,5;12\n', 'metric', 'en-GB');
    expect(r.errors).toEqual([expect.stringMatching(/^Row 2: depth “0,5” is not a number \(use a point for decimals/)]);
  });

  test('does give one short error for a binary file', () => {
    const bytes = Array.from({ length: 3000 }, (_, i) => String.fromCharCode((i * 7919) % 256)).join('');
    const r = parseStageCsv(bytes, 'metric', 'en-GB');
    expect(r).toEqual({ points: [], errors: ['This is not a CSV text file, so nothing was read from it.'], notText: true });
  });

  test('does list a few row problems and count the rest', () => {
    const text = ['0,1', ...Array.from({ length: 40 }, () => 'x,y')].join('\n');
    const r = parseStageCsv(text, 'metric', 'en-GB');
    expect(r.errors).toHaveLength(6);
    expect(r.errors[5]).toBe('…and 35 more rows with problems.');
  });
});
