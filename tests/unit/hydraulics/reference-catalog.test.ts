import { describe, expect, test } from 'vitest';
import { findFitting, findSize } from '../../../src/lib/hydraulics/catalog';
import { loadFixture } from './reference-fixture';

// Reference: the pipe schedule tables and Crane-method fitting functions shipped with fluids
// (Python, Debian python3-fluids), via tests/fixtures/pipe-sizes.json and fittings-crane.json.
interface SizeRow {
  family: string;
  nps: number;
  schedule: string;
  inner_diameter_m: number;
}
interface FittingRow {
  id: string;
  call: string;
  k: number;
}
const sizes = loadFixture<SizeRow>('pipe-sizes.json');
const crane = loadFixture<FittingRow>('fittings-crane.json');

const sizeId = (r: SizeRow): string => `${r.family}-${String(r.nps).replace('.', '-')}in`;

describe(`catalogue sizes against fluids ${sizes.libraries.fluids} pipe tables`, () => {
  // ASTM D1785 (PVC) and ASME B36.10M (steel) inside diameters. fluids stores B36.10M in mm
  // rounded to 0.01 mm, so the tolerance is 0.05 mm on the bore.
  test.each(sizes.cases.map((r) => [sizeId(r), r] as const))(
    'does %s bore within 0.05 mm',
    (id, r) => {
      const size = findSize(id);
      expect(size, id).toBeDefined();
      expect(Math.abs(size!.inner_diameter_m - r.inner_diameter_m)).toBeLessThan(5e-5);
    },
  );
});

describe(`catalogue K values against fluids ${crane.libraries.fluids} Crane-method functions`, () => {
  // Entrance and exit K are table constants: equal to 1e-9. Valves and bends are n·f_T; ours use
  // f_T = 0.019 at 2 in, fluids computes f_T from Colebrook (≈ 0.0188), so 2 %. The long-radius
  // 45° elbow is a common-practice round figure (0.2): 10 %.
  const tolerance = (id: string): number =>
    id.startsWith('entrance') || id.startsWith('exit')
      ? 1e-9
      : id === 'elbow-45-long-radius'
        ? 0.1
        : 0.02;
  test.each(crane.cases.map((r) => [r.id, r] as const))('does %s', (id, r) => {
    const f = findFitting(id);
    expect(f, id).toBeDefined();
    expect(Math.abs(f!.k / r.k - 1)).toBeLessThan(tolerance(id));
  });
});
