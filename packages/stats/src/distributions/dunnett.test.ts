import { describe, expect, it } from "vitest";
import { dunnettCdf, dunnettQuantile, dunnettSf } from "./dunnett.js";
import { tQuantile, tTwoSided } from "./t.js";

describe("Dunnett's distribution", () => {
  it("one comparison is Student's t (identity)", () => {
    expect(Math.abs(dunnettSf(2.4, [0.5], 14) - tTwoSided(2.4, 14))).toBeLessThan(1e-12);
    expect(dunnettQuantile(0.95, [0.5], 14)).toBeCloseTo(tQuantile(0.975, 14), 12);
  });

  it("cdf + sf = 1; more comparisons need a larger critical value; Bonferroni bounds it", () => {
    const l = Math.SQRT1_2;
    expect(Math.abs(dunnettCdf(2.5, [l, l, l], 20) + dunnettSf(2.5, [l, l, l], 20) - 1)).toBeLessThan(1e-12);
    const c2 = dunnettQuantile(0.95, [l, l], 20);
    const c4 = dunnettQuantile(0.95, [l, l, l, l], 20);
    expect(c4).toBeGreaterThan(c2);
    expect(c4).toBeLessThan(tQuantile(1 - 0.05 / 8, 20));
  });

  it("rejects λ outside (0, 1) and df < 1", () => {
    expect(() => dunnettSf(2, [1], 10)).toThrow(/λ strictly between 0 and 1; got 1/);
    expect(() => dunnettSf(2, [0.5], 0)).toThrow(/at least 1 degree of freedom/);
  });
});
