import { describe, expect, it } from "vitest";
import { shapiroWilk } from "./shapiro-wilk.js";

const sorted = (xs: number[]) => Float64Array.from(xs).sort();

describe("shapiroWilk", () => {
  it("gives the exact n = 3 result (closed form, Shapiro & Wilk 1965)", () => {
    // n = 3: a = (−1/√2, 0, 1/√2), so W = ((x3 − x1)²/2)/SS; 1, 2, 4: (9/2)/(14/3) = 27/28;
    // p = (6/π)(asin √W − asin √(3/4)).
    const r = shapiroWilk(sorted([1, 2, 4]));
    if (!r.available) throw new Error(r.reason);
    expect(r.W).toBeCloseTo(27 / 28, 15);
    expect(r.p).toBeCloseTo((6 / Math.PI) * (Math.asin(Math.sqrt(27 / 28)) - Math.PI / 3), 14);
  });

  it("never returns p < 0 at n = 3 (the trap), even at the smallest possible W", () => {
    for (const xs of [
      [0, 0, 1],
      [0, 1e-12, 1],
      [5, 5, 5 + 1e-9],
      [1e9, 1e9, 1e9 + 1],
    ]) {
      const r = shapiroWilk(sorted(xs));
      if (!r.available) throw new Error(r.reason);
      expect(r.p).toBeGreaterThanOrEqual(0);
      expect(r.W).toBeGreaterThanOrEqual(0.75 - 1e-12);
    }
  });

  it("is invariant to location and scale, including large offsets (median centring)", () => {
    const base = [2.1, 3.4, 1.9, 5.6, 4.4, 3.3, 2.8, 6.1, 3.0, 2.2, 4.9, 3.7, 1.2];
    const a = shapiroWilk(sorted(base));
    const b = shapiroWilk(sorted(base.map((x) => 1e6 + 1000 * x)));
    if (!a.available || !b.available) throw new Error("unavailable");
    expect(b.W).toBeCloseTo(a.W, 12);
    expect(b.p).toBeCloseTo(a.p, 10);
  });

  it("explains n < 3, n > 5000 and zero range", () => {
    expect(shapiroWilk(sorted([1, 2]))).toMatchObject({
      available: false,
      reason: expect.stringContaining("at least 3"),
    });
    expect(shapiroWilk(new Float64Array(5001).map((_, i) => i))).toMatchObject({
      available: false,
      reason: expect.stringContaining("5000"),
    });
    expect(shapiroWilk(sorted([4, 4, 4, 4]))).toMatchObject({
      available: false,
      reason: expect.stringContaining("identical"),
    });
  });

  it("finds no departure for symmetric normal-score-like data", () => {
    // Blom scores themselves are as normal as a sample can look.
    const r = shapiroWilk(sorted([-1.5, -0.8, -0.35, 0, 0.35, 0.8, 1.5]));
    if (!r.available) throw new Error(r.reason);
    expect(r.W).toBeGreaterThan(0.95);
    expect(r.p).toBeGreaterThan(0.5);
  });
});
