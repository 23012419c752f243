import { describe, expect, it } from "vitest";
import { outliers } from "./outliers.js";

describe("outliers", () => {
  it("flags values beyond Tukey's fences with their rows (hand computation)", () => {
    // 1..9, 40 (n = 10): Q1 = 3.25, Q3 = 7.75, IQR = 4.5; 3-IQR fence 21.25 → 40 is extreme.
    const r = outliers([
      { name: "A", values: [1, 2, 3, 4, 5, 6, 7, 8, 9, 40], rows: [2, 3, 4, 5, 6, 7, 8, 9, 10, 11] },
      { name: "B", values: [5, 6, 7, 5, 6, 7, 5, 6] },
    ]);
    if (!r.available) throw new Error("unavailable");
    const a = r.groups[0]!;
    expect(a.upperFence).toBe(14.5);
    expect(a.upperExtremeFence).toBe(21.25);
    expect(a.extreme).toMatchObject([{ value: 40, row: 11 }]);
    expect(a.mildCount).toBe(0);
    expect(r.totalExtreme).toBe(1);
  });

  it("uses internally studentized residuals e/√(MS_W(1 − 1/n))", () => {
    const values = [0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 10];
    const r = outliers([
      { name: "A", values },
      { name: "B", values: [1, -1, 1, -1] },
    ]);
    if (!r.available) throw new Error("unavailable");
    // Group A mean 0.5; SS_W = 19·0.25 + 9.5² + 4 = 99; df 22; MS_W = 4.5; scale √(4.5·0.95).
    const expected = 9.5 / Math.sqrt(4.5 * 0.95);
    expect(r.groups[0]!.largeResidual[0]!.studentizedResidual).toBeCloseTo(expected, 12);
  });
});
