import betainc from "@stdlib/math-base-special-betainc";
import betaln from "@stdlib/math-base-special-betaln";
import erfc from "@stdlib/math-base-special-erfc";
import gammainc from "@stdlib/math-base-special-gammainc";
import gammaln from "@stdlib/math-base-special-gammaln";

/** Below this a tail computed directly is no longer trusted to keep its relative accuracy. */
const DIRECT_FLOOR = 1e-280;
const LN10 = Math.LN10;
const TINY = 1e-300;
const EPS = 1e-16;
const MAX_TERMS = 100_000;

/**
 * log₁₀ of the F distribution's upper tail, P(F > f) = I_x(d₂/2, d₁/2), x = d₂/(d₂ + d₁f),
 * valid far below the smallest double. In words: where the tail is above 1e-280 it is
 * the incomplete beta itself; below, log I_x(a, b) = a·ln x + b·ln(1 − x) − ln a − ln B(a, b)
 * + ln(CF), CF the continued fraction for the incomplete beta evaluated by the modified Lentz
 * method (it converges fast because x < (a + 1)/(a + b + 2) whenever the tail is that small).
 * References: Abramowitz & Stegun (1964), 26.5.8 (the continued fraction); Lentz (1976),
 * Applied Optics 15, 668–671; checked against scipy 1.10.1 f.logsf and the closed form for
 * even d₁ (test/fixtures/log10-tails).
 * Example: log10FSf(100000, 6, 1000) → −1384.339…  Cost: O(√max(a, b)) terms at most.
 * Returns 0 for f ≤ 0 and −Infinity for f = Infinity.
 */
export function log10FSf(f: number, d1: number, d2: number): number {
  if (!(f > 0)) return 0;
  if (f === Infinity) return -Infinity;
  const a = d2 / 2;
  const b = d1 / 2;
  const direct = betainc(d2 / (d2 + d1 * f), a, b);
  if (direct > DIRECT_FLOOR) return Math.log10(direct);
  // ln x and ln(1 − x) without forming 1 − x.
  const lnX = -Math.log1p((d1 * f) / d2);
  const ln1mX = -Math.log1p(d2 / (d1 * f));
  const x = Math.exp(lnX);
  const front = a * lnX + b * ln1mX - Math.log(a) - betaln(a, b);
  return (front + Math.log(betaContinuedFraction(a, b, x))) / LN10;
}

/** The incomplete beta continued fraction (A&S 26.5.8) by the modified Lentz method. */
function betaContinuedFraction(a: number, b: number, x: number): number {
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAX_TERMS; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) break;
  }
  return h;
}

/**
 * log₁₀ of the chi-square upper tail, P(X > x) = Q(ν/2, x/2), valid far below the smallest
 * double. In words: the regularized upper incomplete gamma where it is above 1e-280; below,
 * ln Q(a, y) = −y + a·ln y − ln Γ(a) + ln(CF), CF Legendre's continued fraction for Γ(a, y)
 * (it converges fast because y > a + 1 whenever the tail is that small), by modified Lentz.
 * References: Abramowitz & Stegun (1964), 6.5.31 (the continued fraction); checked against
 * scipy 1.10.1 chi2.logsf and closed forms for ν = 1, 3 and even ν (test/fixtures/log10-tails).
 * Example: log10ChiSquareSf(3000, 2) → −651.4417…  Cost: O(√a) terms at most.
 * Returns 0 for x ≤ 0 and −Infinity for x = Infinity.
 */
export function log10ChiSquareSf(x: number, df: number): number {
  if (!(x > 0)) return 0;
  if (x === Infinity) return -Infinity;
  const a = df / 2;
  const y = x / 2;
  const direct = gammainc(y, a, true, true);
  if (direct > DIRECT_FLOOR) return Math.log10(direct);
  let bb = y + 1 - a;
  let c = 1 / TINY;
  let d = 1 / bb;
  let h = d;
  for (let i = 1; i <= MAX_TERMS; i++) {
    const an = -i * (i - a);
    bb += 2;
    d = an * d + bb;
    if (Math.abs(d) < TINY) d = TINY;
    c = bb + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) break;
  }
  return (-y + a * Math.log(y) - gammaln(a) + Math.log(h)) / LN10;
}

const HALF_LN_2PI = 0.5 * Math.log(2 * Math.PI);

/**
 * log₁₀ of the standard normal upper tail P(Z > z), valid far below the smallest double.
 * In words: ½·erfc(z/√2) for z ≤ 30; beyond, the asymptotic series
 * ln Q(z) = −z²/2 − ln(z√(2π)) + ln(1 − 1/z² + 3/z⁴ − 15/z⁶ + …), whose terms
 * (2k − 1)!!/z^{2k} are below 1e-20 by the tenth at z = 30.
 * References: Abramowitz & Stegun (1964), 26.2.12; checked against scipy 1.10.1 norm.logsf
 * (test/fixtures/log10-tails).
 * Example: log10NormalSf(45) → −441.7757…  Cost: O(1).
 */
export function log10NormalSf(z: number): number {
  if (z === Infinity) return -Infinity;
  if (z <= 30) return Math.log10(0.5 * erfc(z / Math.SQRT2));
  const r = 1 / (z * z);
  let term = 1;
  let series = 1;
  for (let k = 1; k <= 12; k++) {
    term *= -(2 * k - 1) * r;
    series += term;
  }
  return (-0.5 * z * z - Math.log(z) - HALF_LN_2PI + Math.log(series)) / LN10;
}
