import { describe, expect, it } from "vitest";
import { tukeyKramer } from "./tukey-kramer.js";
import { tTwoSided } from "../distributions/t.js";

const s = (name: string, n: number, mean: number, variance: number) => ({ name, n, mean, variance });

describe("Tukey–Kramer", () => {
  it("k = 2: q = √2·|t| and the p-value is the pooled t-test's", () => {
    const a = s("A", 7, 3.1, 1.2);
    const b = s("B", 11, 4.0, 0.8);
    const df = 16;
    const ms = (6 * 1.2 + 10 * 0.8) / df;
    const r = tukeyKramer([a, b], ms, df);
    if (!r.available) throw new Error(r.reason);
    const t = (a.mean - b.mean) / Math.sqrt(ms * (1 / 7 + 1 / 11));
    expect(r.pairs[0]!.q).toBeCloseTo(Math.SQRT2 * Math.abs(t), 12);
    expect(Math.abs(r.pairs[0]!.pAdj - tTwoSided(t, df))).toBeLessThan(1e-12);
  });

  it("pairs come in input order with diff = mean_a − mean_b, and each interval contains diff", () => {
    const groups = [s("A", 5, 10, 4), s("B", 6, 12, 3), s("C", 4, 15, 5), s("D", 8, 11, 2)];
    const r = tukeyKramer(groups, 3.5, 19);
    if (!r.available) throw new Error(r.reason);
    expect(r.pairs.map((p) => `${p.a}${p.b}`)).toEqual(["AB", "AC", "AD", "BC", "BD", "CD"]);
    for (const p of r.pairs) {
      expect(p.lower).toBeLessThan(p.diff);
      expect(p.upper).toBeGreaterThan(p.diff);
      // The interval excludes 0 exactly when p_adj < α.
      expect(p.lower > 0 || p.upper < 0).toBe(p.pAdj < 0.05);
    }
    expect(r.pairs[1]!.diff).toBe(-5);
  });

  it("MS_W = 0 is unavailable with a reason; bad input throws the house pattern", () => {
    const r = tukeyKramer([s("A", 3, 1, 0), s("B", 3, 2, 0)], 0, 4);
    expect(r.available).toBe(false);
    expect(() => tukeyKramer([s("A", 3, 1, 1), s("B", 1, 2, 0)], 1, 2)).toThrow(
      "Tukey–Kramer needs at least two values in every group; group 'B' has 1",
    );
    expect(() => tukeyKramer([s("A", 3, 1, 1)], 1, 2)).toThrow(/at least two groups; got 1/);
    expect(() => tukeyKramer([s("A", 3, 1, 1), s("B", 3, 2, 1)], 1, 4, 0)).toThrow(/alpha between 0 and 1/);
  });
});
