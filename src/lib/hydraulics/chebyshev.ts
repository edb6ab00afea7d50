/**
 * Piecewise Chebyshev interpolation of an expensive smooth function.
 *
 * The drain solver needs the outlet flow at thousands of quadrature nodes, but each flow is a
 * full line or siphon solve. The flow is smooth in the level, so it is sampled once at Chebyshev
 * points of the first kind and interpolated; a piece is accepted when its last three
 * coefficients fall below `relTol` of the largest, otherwise it is halved (the usual
 * coefficient-decay test, Trefethen, "Approximation Theory and Approximation Practice", 2013).
 */

const N = 16;
const NODES = Array.from({ length: N }, (_, k) => Math.cos((Math.PI * (k + 0.5)) / N));
const COS = Array.from({ length: N }, (_, j) =>
  Array.from({ length: N }, (_, k) => Math.cos((Math.PI * j * (k + 0.5)) / N)),
);

export interface ChebPiece {
  a: number;
  b: number;
  c: Float64Array;
}

/** Coefficients of the degree N−1 interpolant of f on [a, b] at Chebyshev points. */
function fit(f: (x: number) => number, a: number, b: number): Float64Array {
  const values = NODES.map((t) => f(0.5 * (a + b) + 0.5 * (b - a) * t));
  const c = new Float64Array(N);
  for (let j = 0; j < N; j++) {
    let s = 0;
    for (let k = 0; k < N; k++) s += values[k] * COS[j][k];
    c[j] = ((j === 0 ? 1 : 2) * s) / N;
  }
  return c;
}

/** Clenshaw evaluation of a piece at x (x within [a, b]). */
export function evalPiece(p: ChebPiece, x: number): number {
  const w = p.b - p.a;
  const t = w > 0 ? (2 * x - p.a - p.b) / w : 0; // a piece of zero width is a constant
  const c = p.c;
  let b1 = 0;
  let b2 = 0;
  for (let j = N - 1; j >= 1; j--) {
    const b0 = 2 * t * b1 - b2 + c[j];
    b2 = b1;
    b1 = b0;
  }
  return t * b1 - b2 + c[0];
}

function converged(c: Float64Array, relTol: number): boolean {
  let big = 0;
  for (let j = 0; j < N; j++) big = Math.max(big, Math.abs(c[j]));
  const tail = Math.max(Math.abs(c[N - 1]), Math.abs(c[N - 2]), Math.abs(c[N - 3]));
  return tail <= relTol * big;
}

/** Most pieces one interpolant may use, so a rough function cannot make a request hang. */
const MAX_PIECES = 256;

/**
 * Adaptive piecewise interpolant of f on [a, b], pieces in ascending order. Unconverged pieces
 * are halved level by level; a piece narrower than `minWidth` (below the resolution at which f
 * can be told apart from rounding) is accepted as it is, as are all once MAX_PIECES is reached.
 */
export function chebFit(
  f: (x: number) => number,
  a: number,
  b: number,
  relTol: number,
  minWidth = 0,
): ChebPiece[] {
  let pieces: { p: ChebPiece; done: boolean }[] = [{ p: { a, b, c: fit(f, a, b) }, done: false }];
  for (let level = 0; level < 60; level++) {
    const next: { p: ChebPiece; done: boolean }[] = [];
    let split = false;
    let count = pieces.length;
    for (const item of pieces) {
      const { p } = item;
      const m = 0.5 * (p.a + p.b);
      const stop =
        item.done || converged(p.c, relTol) || p.b - p.a <= minWidth || !(m > p.a && m < p.b);
      if (stop || count >= MAX_PIECES) {
        next.push({ p, done: true });
        continue;
      }
      split = true;
      count++;
      next.push({ p: { a: p.a, b: m, c: fit(f, p.a, m) }, done: false });
      next.push({ p: { a: m, b: p.b, c: fit(f, m, p.b) }, done: false });
    }
    pieces = next;
    if (!split) break;
  }
  return pieces.map((x) => x.p);
}

/** Evaluator over a list of pieces, caching the last piece (callers walk in order). */
export function piecewise(pieces: ChebPiece[]): (x: number) => number {
  let i = 0;
  return (x: number): number => {
    if (x < pieces[i].a || x > pieces[i].b) {
      let lo = 0;
      let hi = pieces.length - 1;
      while (lo < hi) {
        const mid = (lo + hi + 1) >> 1;
        if (pieces[mid].a <= x) lo = mid;
        else hi = mid - 1;
      }
      i = lo;
    }
    return evalPiece(pieces[i], x);
  };
}
