import { describe, expect, test } from 'vitest';
import {
  colebrookSlope,
  colebrookWhite,
  colebrookX,
  frictionFactor,
  swameeJain,
} from '../../../src/lib/hydraulics/friction';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

/** Residual of the Colebrook–White equation itself, relative to 1/√f. */
function residual(re: number, rr: number, f: number): number {
  const x = 1 / Math.sqrt(f);
  return Math.abs(x + 2 * Math.log10(rr / 3.7 + (2.51 * x) / re)) / x;
}

// python3-fluids 1.0.22: fluids.friction.Colebrook(Re, eD) (exact solution via Lambert W).
const FLUIDS_COLEBROOK: [number, number, number][] = [
  [4000, 0, 0.0399070140556349],
  [1e4, 1e-3, 0.03238180636309272],
  [1e5, 1e-4, 0.018513866077471648],
  [1e6, 1e-5, 0.011869544827944955],
  [1e7, 0, 0.008102669430874912],
  [1e8, 0.05, 0.07155090409108325],
  [5e4, 0.01, 0.039081647020699335],
  [2.5e5, 2e-4, 0.016610110405932934],
];

describe('colebrookWhite', () => {
  test.each(FLUIDS_COLEBROOK)(
    'matches python3-fluids Colebrook(%d, %d) to 1e-12 relative (0.1 % required)',
    (re, rr, f) => {
      expect(rel(colebrookWhite(re, rr), f)).toBeLessThan(1e-12);
    },
  );

  test('satisfies the Colebrook–White equation to 1e-12 relative over Re 4e3–1e8, ε/D 0–0.05', () => {
    for (const re of [4e3, 1e4, 3e4, 1e5, 1e6, 1e7, 1e8]) {
      for (const rr of [0, 1e-6, 1e-5, 1e-4, 1e-3, 1e-2, 0.05]) {
        expect(residual(re, rr, colebrookWhite(re, rr))).toBeLessThan(1e-12);
      }
    }
  });

  test('reads like the Moody chart: smooth Re 1e5 ≈ 0.018, ε/D 0.01 fully rough ≈ 0.038 (from memory, ±5 %)', () => {
    expect(rel(colebrookWhite(1e5, 0), 0.018)).toBeLessThan(0.05);
    expect(rel(colebrookWhite(1e8, 0.01), 0.038)).toBeLessThan(0.05);
  });

  test('converges from a poor seed too (Newton on 1/√f)', () => {
    const f = 1 / colebrookX(1e5, 1e-4, 0.5) ** 2;
    expect(rel(f, 0.018513866077471648)).toBeLessThan(1e-12);
  });
});

describe('swameeJain', () => {
  test('is within 1.5 % of python3-fluids Colebrook (its published accuracy is about 1 %)', () => {
    for (const [re, rr, f] of FLUIDS_COLEBROOK.filter(([re, rr]) => re >= 5e3 && rr <= 1e-2)) {
      expect(rel(swameeJain(re, rr), f)).toBeLessThan(0.015);
    }
  });
});

describe('colebrookSlope', () => {
  test('agrees with a central difference of python3-fluids values (Re 1e5 ± 1e2, ε/D 1e-4)', () => {
    // python3-fluids 1.0.22: Colebrook(100100, 1e-4) and Colebrook(99900, 1e-4)
    const fd = (0.018510408239400002 - 0.018517328679010125) / 200;
    const x = 1 / Math.sqrt(colebrookWhite(1e5, 1e-4));
    expect(rel(colebrookSlope(1e5, 1e-4, x), fd)).toBeLessThan(1e-4);
  });
});

describe('frictionFactor', () => {
  test('is 64/Re for laminar flow (Hagen–Poiseuille)', () => {
    expect(frictionFactor(1000, 1e-3)).toEqual({ f: 0.064, regime: 'laminar' });
    expect(frictionFactor(2000, 0).regime).toBe('laminar');
  });

  test('is continuous at Re = 2000 and Re = 4000 (the stated transition rule)', () => {
    const rr = 1e-3;
    expect(rel(frictionFactor(2000 + 1e-9, rr).f, 64 / 2000)).toBeLessThan(1e-9);
    expect(rel(frictionFactor(4000 - 1e-9, rr).f, colebrookWhite(4000, rr))).toBeLessThan(1e-9);
    expect(frictionFactor(3000, rr).regime).toBe('transitional');
  });

  test('interpolates linearly in Re at mid-transition: (0.032 + fluids Colebrook(4000, 0))/2', () => {
    // python3-fluids 1.0.22: Colebrook(4000, 0) = 0.0399070140556349
    expect(rel(frictionFactor(3000, 0).f, (0.032 + 0.0399070140556349) / 2)).toBeLessThan(1e-12);
  });

  test('uses Colebrook–White from Re = 4000 (python3-fluids Colebrook(4000, 0))', () => {
    const r = frictionFactor(4000, 0);
    expect(r.regime).toBe('turbulent');
    expect(rel(r.f, 0.0399070140556349)).toBeLessThan(1e-12);
  });
});
