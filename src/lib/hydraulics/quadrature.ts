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

/** Kronrod 7-point abscissae (positive half, last is 0) and weights; Gauss 3 at [1] and [3]. */
const XK7 = [0.96049126870802028342, 0.77459666924148337704, 0.434243749346802558, 0];
const WK7 = [
  0.10465622602646726519, 0.26848808986833344073, 0.40139741477596222291, 0.45091653865847414235,
];

/**
 * One Gauss–Kronrod 3/7 pass on [a, b] (Kronrod 1965; weights as tabulated in QUADPACK's
 * companion literature): the Kronrod estimate and |Kronrod − Gauss| as its error. Cheaper than
 * GK15 for the many short, smooth pieces between the rows of a depth–area table.
 */
export function gk7(f: (x: number) => number, a: number, b: number): [number, number] {
  const c = 0.5 * (a + b);
  const h = 0.5 * (b - a);
  const f0 = f(c);
  const f1 = f(c - h * XK7[1]) + f(c + h * XK7[1]);
  const k =
    WK7[3] * f0 +
    WK7[1] * f1 +
    WK7[0] * (f(c - h * XK7[0]) + f(c + h * XK7[0])) +
    WK7[2] * (f(c - h * XK7[2]) + f(c + h * XK7[2]));
  const g = (8 / 9) * f0 + (5 / 9) * f1;
  return [k * h, Math.abs((k - g) * h)];
}

/** An embedded quadrature pair: estimate and error on [a, b]. */
export type Rule = (f: (x: number) => number, a: number, b: number) => [number, number];

/** Most pieces the adaptive rule may split an integral into (QUADPACK's default `limit` is 50). */
const MAX_PIECES = 400;

/**
 * ∫ₐᵇ f(x) dx by globally adaptive GK15 (QUADPACK QAG strategy): the piece with the largest
 * error estimate is halved until the summed estimate is within max(relTol·|I|, absTol) or
 * MAX_PIECES is reached (the bound that keeps a request from hanging on a rough integrand).
 */
export function integrateRel(
  f: (x: number) => number,
  a: number,
  b: number,
  relTol: number,
  absTol = 0,
  rule: Rule = gk15,
): number {
  const [k0, e0] = rule(f, a, b);
  const lo = [a];
  const hi = [b];
  const val = [k0];
  const err = [e0];
  let total = k0;
  let totalErr = e0;
  while (totalErr > Math.max(relTol * Math.abs(total), absTol) && val.length < MAX_PIECES) {
    let w = 0;
    for (let i = 1; i < err.length; i++) if (err[i] > err[w]) w = i;
    const m = 0.5 * (lo[w] + hi[w]);
    if (!(m > lo[w] && m < hi[w])) break; // no room left to split in floating point
    const [k1, e1] = rule(f, lo[w], m);
    const [k2, e2] = rule(f, m, hi[w]);
    total += k1 + k2 - val[w];
    totalErr += e1 + e2 - err[w];
    lo.push(m);
    hi.push(hi[w]);
    val.push(k2);
    err.push(e2);
    hi[w] = m;
    val[w] = k1;
    err[w] = e1;
  }
  return total;
}
