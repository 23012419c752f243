import { describe, expect, it } from "vitest";
import { centralMoments } from "./central-moments.js";

describe("centralMoments", () => {
  it("gives the moments of a small sample (hand computation)", () => {
    // 1..4: mean 2.5; deviations ±0.5, ±1.5; SS = 5, Σd³ = 0, Σd⁴ = 2·(0.0625 + 5.0625) = 10.25.
    expect(centralMoments([1, 2, 3, 4])).toEqual({ n: 4, mean: 2.5, ss: 5, m3: 0, m4: 10.25 });
  });

  it("keeps the SS of offset data that a one-pass formula loses", () => {
    const x = [1e9 + 1, 1e9 + 2, 1e9 + 3, 1e9 + 4];
    expect(centralMoments(x).ss).toBe(5);
    const onePass = x.reduce((s, v) => s + v * v, 0) - x.reduce((s, v) => s + v, 0) ** 2 / 4;
    expect(onePass).not.toBe(5); // the trap this guards against
  });

  it("returns zeros for an empty array", () => {
    expect(centralMoments([])).toEqual({ n: 0, mean: 0, ss: 0, m3: 0, m4: 0 });
  });
});
