import { describe, expect, it } from "vitest";
import { studentizedRangeCdf, studentizedRangeQuantile, studentizedRangeSf } from "./studentized-range.js";
import { tQuantile, tTwoSided } from "./t.js";
import { normalTwoSided } from "./normal.js";

describe("studentized range", () => {
  it("k = 2 is √2 times |t|: P(Q > q) = P(|T| > q/√2) (identity)", () => {
    for (const df of [1, 2, 7, 40, Infinity]) {
      for (const q of [0.2, 1.5, 4, 9]) {
        const expected = df === Infinity ? normalTwoSided(q / Math.SQRT2) : tTwoSided(q / Math.SQRT2, df);
        expect(Math.abs(studentizedRangeSf(q, 2, df) - expected) / expected).toBeLessThan(1e-11);
      }
    }
    expect(studentizedRangeQuantile(0.95, 2, 12) / Math.SQRT2).toBeCloseTo(tQuantile(0.975, 12), 11);
  });

  it("cdf + sf = 1, both monotone in q, and the quantile inverts the cdf", () => {
    for (const [k, df] of [
      [3, 5],
      [10, 60],
      [25, 2],
    ] as const) {
      let prev = 0;
      for (const q of [0.5, 1, 2, 3, 4, 6, 8]) {
        const c = studentizedRangeCdf(q, k, df);
        expect(Math.abs(c + studentizedRangeSf(q, k, df) - 1)).toBeLessThan(1e-12);
        expect(c).toBeGreaterThan(prev);
        prev = c;
      }
      for (const p of [0.01, 0.5, 0.95, 0.999]) {
        expect(studentizedRangeCdf(studentizedRangeQuantile(p, k, df), k, df)).toBeCloseTo(p, 12);
      }
    }
  });

  it("keeps relative accuracy far in the upper tail instead of returning 0", () => {
    const far = studentizedRangeSf(60, 4, 30);
    expect(far).toBeGreaterThan(0);
    expect(far).toBeLessThan(1e-20);
    expect(studentizedRangeSf(20, 5, Infinity)).toBeGreaterThan(1e-50);
  });

  it("large df approaches the infinite-df law", () => {
    expect(Math.abs(studentizedRangeSf(3.5, 4, 1e7) - studentizedRangeSf(3.5, 4, Infinity))).toBeLessThan(
      1e-7,
    );
  });

  it("edges: q ≤ 0 and q = ∞", () => {
    expect(studentizedRangeCdf(0, 3, 10)).toBe(0);
    expect(studentizedRangeSf(-1, 3, 10)).toBe(1);
    expect(studentizedRangeSf(Infinity, 3, 10)).toBe(0);
    expect(studentizedRangeQuantile(0, 3, 10)).toBe(0);
    expect(studentizedRangeQuantile(1, 3, 10)).toBe(Infinity);
  });

  it("rejects k < 2, df < 1 and bad probabilities with plain messages", () => {
    expect(() => studentizedRangeSf(2, 1, 10)).toThrow(/at least 2; got 1/);
    expect(() => studentizedRangeCdf(2, 3, 0.5)).toThrow(/at least 1 degree of freedom; got 0.5/);
    expect(() => studentizedRangeQuantile(1.2, 3, 10)).toThrow(/between 0 and 1; got 1.2/);
    expect(() => studentizedRangeSf(Number.NaN, 3, 10)).toThrow(/NaN/);
  });
});
