import { describe, expect, it } from "vitest";
import { hedgesG } from "./hedges-g.js";

const g = (n: number, mean: number, variance: number, name = "x") => ({ name, n, mean, variance });

describe("Hedges' g", () => {
  it("pools the two variances and applies the exact correction J(ν)", () => {
    const r = hedgesG(g(10, 5, 4, "a"), g(12, 4, 4, "b"));
    if (!r.available) throw new Error(r.reason);
    expect(r.d).toBeCloseTo(0.5, 14);
    expect(r.correction).toBeLessThan(1);
    // The common approximation 1 − 3/(4ν − 1) is within 0.001 for ν ≥ 6 (Hedges 1981).
    expect(Math.abs(r.correction - (1 - 3 / (4 * 20 - 1)))).toBeLessThan(1e-3);
    expect(r.g).toBeCloseTo(r.correction * r.d, 14);
  });

  it("changes sign with the order of the groups", () => {
    const ab = hedgesG(g(6, 1, 2), g(9, 3, 1));
    const ba = hedgesG(g(9, 3, 1), g(6, 1, 2));
    if (!ab.available || !ba.available) throw new Error("unavailable");
    expect(ab.g).toBeCloseTo(-ba.g, 14);
  });

  it("is unavailable with a reason when there is no spread or too few values", () => {
    const flat = hedgesG(g(5, 1, 0, "A"), g(5, 2, 0, "B"));
    expect(flat.available).toBe(false);
    if (!flat.available) expect(flat.reason).toMatch(/'A' and 'B'.*no spread/);
    expect(hedgesG(g(1, 1, 0), g(2, 2, 1)).available).toBe(false);
  });
});
