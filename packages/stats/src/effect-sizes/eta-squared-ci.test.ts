import { describe, expect, it } from "vitest";
import { etaSquaredCi } from "./eta-squared-ci.js";
import { noncentralFCdf } from "../distributions/noncentral-f.js";

describe("η² confidence interval", () => {
  it("its λ bounds put the observed F at the 1 − α/2 and α/2 points", () => {
    const r = etaSquaredCi(6, 3, 40, 0.95);
    if (!r.available) throw new Error(r.reason);
    expect(noncentralFCdf(6, 3, 40, r.lambdaLower)).toBeCloseTo(0.975, 10);
    expect(noncentralFCdf(6, 3, 40, r.lambdaUpper)).toBeCloseTo(0.025, 10);
    const point = (6 * 3) / (6 * 3 + 40); // η² = F·df1/(F·df1 + df2)
    expect(r.lower).toBeLessThan(point);
    expect(r.upper).toBeGreaterThan(point);
  });

  it("clamps the lower bound (and if need be the upper) at 0 for a small F", () => {
    const r = etaSquaredCi(0.5, 2, 30);
    if (!r.available) throw new Error(r.reason);
    expect(r.lower).toBe(0);
    expect(r.upper).toBeGreaterThan(0);
    const tiny = etaSquaredCi(0.01, 2, 30);
    if (!tiny.available) throw new Error(tiny.reason);
    expect(tiny.upper).toBe(0);
  });

  it("a wider level gives a wider interval", () => {
    const a = etaSquaredCi(4, 2, 50, 0.9);
    const b = etaSquaredCi(4, 2, 50, 0.99);
    if (!a.available || !b.available) throw new Error("unavailable");
    expect(b.lower).toBeLessThan(a.lower);
    expect(b.upper).toBeGreaterThan(a.upper);
  });

  it("unavailable for a non-finite F; errors for bad levels and df", () => {
    expect(etaSquaredCi(Number.NaN, 2, 10).available).toBe(false);
    expect(() => etaSquaredCi(2, 2, 10, 1)).toThrow(/level between 0 and 1/);
    expect(() => etaSquaredCi(2, 0, 10)).toThrow(/positive degrees of freedom/);
  });
});
