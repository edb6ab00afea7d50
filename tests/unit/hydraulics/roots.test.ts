import { describe, expect, test } from 'vitest';
import { brentRoot } from '../../../src/lib/hydraulics/roots';

describe('brentRoot', () => {
  test('finds the cube root of 2 (closed form 2^(1/3)) to 1e-14', () => {
    expect(Math.abs(brentRoot((x) => x * x * x - 2, 0, 2, 1e-15) - Math.cbrt(2))).toBeLessThan(
      1e-14,
    );
  });

  test('finds the fixed point of cos (Dottie number 0.739085133215160…, from memory) to 1e-12', () => {
    expect(
      Math.abs(brentRoot((x) => Math.cos(x) - x, 0, 1, 1e-14) - 0.73908513321516),
    ).toBeLessThan(1e-12);
  });

  test('returns an end that is already a root, and NaN without a sign change', () => {
    expect(brentRoot((x) => x - 1, 1, 3, 1e-12)).toBe(1);
    expect(brentRoot((x) => x * x + 1, -1, 1, 1e-12)).toBeNaN();
  });

  test('stays inside the bracket on a step-like function (sign change at 0.3)', () => {
    const x = brentRoot((v) => (v < 0.3 ? -1 : 1), 0, 1, 1e-10);
    expect(Math.abs(x - 0.3)).toBeLessThan(1e-9);
  });
});
