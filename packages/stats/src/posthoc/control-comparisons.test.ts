import { describe, expect, it } from "vitest";
import { dunnettTest, welchVsControlHolm } from "./control-comparisons.js";
import { tTwoSided } from "../distributions/t.js";

const s = (name: string, n: number, mean: number, variance: number) => ({ name, n, mean, variance });

describe("comparisons with a control", () => {
  it("Dunnett with one treatment is the pooled t-test", () => {
    const r = dunnettTest([s("C", 10, 5, 1), s("X", 12, 6, 1.5)], "C");
    if (!r.available) throw new Error(r.reason);
    const p = r.pairs[0]!;
    expect([p.a, p.b]).toEqual(["X", "C"]);
    expect(Math.abs(p.pAdj - tTwoSided(p.t, 20))).toBeLessThan(1e-12);
  });

  it("Dunnett's adjusted p lies between the raw t p-value and its Bonferroni bound", () => {
    const r = dunnettTest([s("C", 10, 5, 1), s("X", 10, 5.5, 1), s("Y", 10, 6.5, 1)], "C");
    if (!r.available) throw new Error(r.reason);
    for (const p of r.pairs) {
      const raw = tTwoSided(p.t, r.df);
      expect(p.pAdj).toBeGreaterThan(raw);
      expect(p.pAdj).toBeLessThan(Math.min(1, 2 * raw));
    }
  });

  it("Welch vs control: a constant pair is unavailable, the rest are Holm-adjusted", () => {
    const r = welchVsControlHolm([s("C", 5, 1, 0), s("X", 5, 2, 0), s("Y", 6, 3, 2)], "C");
    expect(r.pairs[0]!.available).toBe(false);
    const y = r.pairs[1]!;
    if (!y.available) throw new Error(y.reason);
    expect(y.pAdj).toBe(y.p); // the only computable comparison: Holm leaves it as it is
  });

  it("an unknown control is an input error", () => {
    expect(() => dunnettTest([s("C", 5, 1, 1), s("X", 5, 2, 1)], "Z")).toThrow(/'Z' is not among them/);
  });
});
