/**
 * Brent's root finder (bracketing with inverse quadratic interpolation, falling back to
 * bisection): Brent (1973), Algorithms for Minimization without Derivatives, ch. 4.
 * Needs f(a) and f(b) of opposite sign (or one of them zero); never leaves [a, b].
 * Example: findRootBrent((x) => x * x - 2, 0, 2) ≈ 1.41421356.
 * Cost: typically 6–15 evaluations of f for 1e-13 relative precision.
 */
export function findRootBrent(
  f: (x: number) => number,
  a: number,
  b: number,
  options: { xTol?: number; maxIter?: number; fa?: number; fb?: number } = {},
): number {
  const xTol = options.xTol ?? 1e-14;
  const maxIter = options.maxIter ?? 200;
  let fa = options.fa ?? f(a);
  let fb = options.fb ?? f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (fa > 0 === fb > 0) throw new RangeError("findRootBrent needs a bracket with a sign change");
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < maxIter; iter++) {
    if (fb > 0 === fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * xTol * Math.max(Math.abs(b), Number.MIN_VALUE);
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Interpolate: secant when only two points differ, else inverse quadratic.
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}
