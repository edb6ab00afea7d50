/**
 * Numerical integration used by the drain-down solver: adaptive Gauss–Kronrod 7/15 (the QUADPACK
 * QK15 rule: Piessens, de Doncker-Kapenga, Überhuber & Kahaner, "QUADPACK", Springer 1983).
 * Pure numerics, no units.
 */

/** Kronrod abscissae on [−1, 1] (positive half, last is 0), QUADPACK qk15. */
const XGK = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
  0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
  0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0,
];
/** Kronrod weights for XGK, QUADPACK qk15. */
const WGK = [
  0.02293532201052922496373200805897, 0.063092092629978553290700663189204,
  0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
  0.16900472663926790282658342659855, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
];
/** 7-point Gauss weights at XGK[1], XGK[3], XGK[5], XGK[7], QUADPACK qk15. */
const WG = [
  0.129484966168869693270611432679082, 0.27970539148927666790146777142378,
  0.381830050505118944950369775488975, 0.417959183673469387755102040816327,
];

/** One GK15 pass on [a, b]: the Kronrod estimate and |Kronrod − Gauss| as its error. */
export function gk15(f: (x: number) => number, a: number, b: number): [number, number] {
  const c = 0.5 * (a + b);
  const h = 0.5 * (b - a);
  const fc = f(c);
  let k = fc * WGK[7];
  let g = fc * WG[3];
  for (let i = 0; i < 7; i++) {
    const dx = h * XGK[i];
    const s = f(c - dx) + f(c + dx);
    k += WGK[i] * s;
    if (i % 2 === 1) g += WG[(i - 1) / 2] * s;
  }
  return [k * h, Math.abs((k - g) * h)];
}

/**
 * ∫ₐᵇ f(x) dx by adaptive bisection with GK15 until each piece's error estimate is within its
 * share of `absTol` (depth-limited to 40 halvings, enough for integrable endpoint singularities).
 */
export function integrate(
  f: (x: number) => number,
  a: number,
  b: number,
  absTol: number,
  depth = 0,
): number {
  const [k, err] = gk15(f, a, b);
  if (err <= absTol || depth >= 40 || b - a <= 1e-15 * Math.abs(a)) return k;
  const m = 0.5 * (a + b);
  return integrate(f, a, m, absTol / 2, depth + 1) + integrate(f, m, b, absTol / 2, depth + 1);
}

/** ∫ₐᵇ f dx to a relative tolerance of the first GK15 estimate (absolute floor `absFloor`). */
export function integrateRel(
  f: (x: number) => number,
  a: number,
  b: number,
  relTol: number,
  absFloor = 0,
): number {
  const [k, err] = gk15(f, a, b);
  const tol = Math.max(relTol * Math.abs(k), absFloor);
  if (err <= tol) return k;
  const m = 0.5 * (a + b);
  return integrate(f, a, m, tol / 2, 1) + integrate(f, m, b, tol / 2, 1);
}
