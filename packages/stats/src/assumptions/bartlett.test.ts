import { describe, expect, it } from "vitest";
import { bartlett } from "./bartlett.js";

describe("bartlett", () => {
  it("matches a hand computation, with integer input (the crash trap)", () => {
    // s² = 1 and 4, pooled 2.5: T = [4 ln 2.5 − 2 ln 4] / [1 + (1/2 + 1/2 − 1/4)/3].
    const r = bartlett([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [2, 4, 6] },
    ]);
    if (!r.available) throw new Error(r.reason);
    expect(r.statistic).toBeCloseTo((4 * Math.log(2.5) - 2 * Math.log(4)) / 1.25, 14);
    expect(r.df).toBe(1);
    // scipy 1.10.1 bartlett([1,2,3],[2,4,6]).pvalue = 0.398099486265193
    expect(r.p).toBeCloseTo(0.398099486265193, 13);
  });

  it("explains a zero-variance group", () => {
    expect(
      bartlett([
        { name: "A", values: [1, 2, 3] },
        { name: "B", values: [7, 7] },
      ]),
    ).toEqual({
      available: false,
      reason:
        "Bartlett's test compares log variances; group 'B' has zero variance, so the statistic is undefined",
    });
  });

  it("is zero for equal variances", () => {
    const r = bartlett([
      { name: "A", values: [1, 2, 3] },
      { name: "B", values: [11, 12, 13] },
    ]);
    if (!r.available) throw new Error(r.reason);
    expect(r.statistic).toBe(0);
    expect(r.p).toBe(1);
  });
});
