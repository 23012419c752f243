import { describe, expect, it } from "vitest";
import { anovaPower } from "./anova-power.js";
import { anovaSampleSize } from "./anova-sample-size.js";
import { effectFFromMeans } from "./effect-f-from-means.js";
import { powerCurve } from "./power-curve.js";
import { familyWiseError } from "./family-wise-error.js";

describe("ANOVA power and sample size", () => {
  it("f = 0 gives power α exactly (the test's size)", () => {
    expect(anovaPower({ k: 3, nPerGroup: 10, f: 0, alpha: 0.05 }).power).toBeCloseTo(0.05, 12);
  });

  it("power rises with n; the curve is monotone and sample size sits where it crosses the target", () => {
    const curve = powerCurve({ k: 4, f: 0.25, nMin: 5, nMax: 80, step: 5 });
    for (let i = 1; i < curve.length; i++) expect(curve[i]!.power).toBeGreaterThan(curve[i - 1]!.power);
    const ss = anovaSampleSize({ k: 4, f: 0.25, power: 0.8 });
    expect(ss.achievedPower).toBeGreaterThanOrEqual(0.8);
    expect(anovaPower({ k: 4, nPerGroup: ss.nPerGroup - 1, f: 0.25 }).power).toBeLessThan(0.8);
  });

  it("unequal allocation uses only the total N (λ = N·f², df2 = N − k)", () => {
    const unequal = anovaPower({ nPerGroup: [10, 20, 30], f: 0.3 });
    const equal = anovaPower({ k: 3, nPerGroup: 20, f: 0.3 });
    expect(unequal.power).toBeCloseTo(equal.power, 14);
    expect(unequal.lambda).toBeCloseTo(60 * 0.09, 12);
  });

  it("Cohen's f uses the k-denominator SD of the means", () => {
    expect(effectFFromMeans([10, 12, 14], 4)).toBeCloseTo(Math.sqrt(8 / 3) / 4, 14);
    expect(() => effectFFromMeans([1], 1)).toThrow(/at least two group means/);
  });

  it("input errors", () => {
    expect(() => anovaPower({ nPerGroup: 10, f: 0.2 })).toThrow(/needs k/);
    expect(() => anovaPower({ k: 3, nPerGroup: 1, f: 0.2 })).toThrow(/group 1 has 1/);
    expect(() => anovaSampleSize({ k: 3, f: 0.2, power: 0.01 })).toThrow(/above alpha/);
  });
});

describe("family-wise error", () => {
  it("k = 7 → m = 21, FWER = 1 − 0.95²¹ ≈ 0.6594 (common practice, textbook formula)", () => {
    const r = familyWiseError({ k: 7, alpha: 0.05 });
    expect(r.m).toBe(21);
    expect(r.fwerIndependent).toBeCloseTo(0.659438, 6);
    expect(r.bonferroniBound).toBe(1);
    expect(r.perComparisonAlphaBonferroni).toBeCloseTo(0.05 / 21, 15);
    // Šidák's level gives FWER α exactly under independence.
    expect(1 - (1 - r.sidakAlpha) ** 21).toBeCloseTo(0.05, 14);
  });

  it("m = 1 is α itself; k and m must agree", () => {
    expect(familyWiseError({ m: 1, alpha: 0.05 }).fwerIndependent).toBeCloseTo(0.05, 15);
    expect(() => familyWiseError({ k: 4, m: 5 })).toThrow(/disagree/);
    expect(() => familyWiseError({ k: 4, m: 6, comparisons: "vs-control" })).toThrow(/k − 1 comparisons/);
    expect(() => familyWiseError({})).toThrow(/needs k/);
  });
});

describe("family-wise error of the comparisons actually planned", () => {
  it("each group against the control, k = 4: m = 3, 1 − 0.95³ = .142625 (arithmetic)", () => {
    const r = familyWiseError({ k: 4, alpha: 0.05, comparisons: "vs-control" });
    expect(r.m).toBe(3);
    expect(r.comparisons).toBe("vs-control");
    expect(r.fwerIndependent).toBeCloseTo(0.142625, 15);
  });
  it("all pairs, k = 4: m = 6, 1 − 0.95⁶ = .264908109375 (arithmetic)", () => {
    const r = familyWiseError({ k: 4, alpha: 0.05, comparisons: "all-pairs" });
    expect(r.m).toBe(6);
    expect(r.fwerIndependent).toBeCloseTo(0.264908109375, 15);
  });
});
