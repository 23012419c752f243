import { describe, expect, it } from "vitest";
import { noncentralFCdf, noncentralFSf } from "./noncentral-f.js";
import { fCdf, fSf } from "./f.js";

describe("noncentral F", () => {
  it("λ → 0 joins the central F", () => {
    expect(noncentralFCdf(2.5, 3, 20, 0)).toBe(fCdf(2.5, 3, 20));
    expect(Math.abs(noncentralFSf(2.5, 3, 20, 1e-10) - fSf(2.5, 3, 20))).toBeLessThan(1e-10);
  });

  it("cdf + sf = 1 and the upper tail grows with λ", () => {
    let prev = 0;
    for (const lambda of [0.5, 5, 50, 500, 2000]) {
      const sf = noncentralFSf(4, 4, 60, lambda);
      expect(Math.abs(noncentralFCdf(4, 4, 60, lambda) + sf - 1)).toBeLessThan(1e-13);
      expect(sf).toBeGreaterThan(prev);
      prev = sf;
    }
  });

  it("small upper tails are summed directly, not 1 − cdf", () => {
    const sf = noncentralFSf(80, 3, 100, 5);
    expect(sf).toBeGreaterThan(0);
    expect(sf).toBeLessThan(1e-18);
  });

  it("edges and input errors", () => {
    expect(noncentralFCdf(0, 3, 10, 4)).toBe(0);
    expect(noncentralFSf(Infinity, 3, 10, 4)).toBe(0);
    expect(() => noncentralFCdf(1, 0, 10, 1)).toThrow(/positive, finite degrees of freedom/);
    expect(() => noncentralFSf(1, 2, 10, -1)).toThrow(/noncentrality of 0 or more; got -1/);
  });
});
