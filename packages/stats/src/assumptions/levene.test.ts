import { describe, expect, it } from "vitest";
import { levene } from "./levene.js";

describe("levene", () => {
  it("mean-centred: ANOVA on |x − mean| (hand computation)", () => {
    // Deviations 1,0,1 vs 2,0,2: SS_B = 2/3, SS_W = 10/3, F = (2/3)/(10/12) = 0.8.
    const r = levene(
      [
        { name: "A", values: [1, 2, 3] },
        { name: "B", values: [2, 4, 6] },
      ],
      "mean",
    );
    if (!r.available) throw new Error(r.reason);
    expect(r.F).toBeCloseTo(0.8, 14);
    expect(r.method).toBe("Levene (mean-centred)");
  });

  it("median-centred (Brown–Forsythe) differs from mean-centred on skewed groups", () => {
    const g = [
      { name: "A", values: [1, 1, 2, 9] },
      { name: "B", values: [3, 4, 4, 5, 20] },
    ];
    const m = levene(g, "mean");
    const d = levene(g, "median");
    if (!m.available || !d.available) throw new Error("unavailable");
    // Hand computation for the median version: A |x − 1.5| = .5,.5,.5,7.5; B |x − 4| = 1,0,0,1,16.
    const a = [0.5, 0.5, 0.5, 7.5];
    const b = [1, 0, 0, 1, 16];
    const ma = a.reduce((s, x) => s + x, 0) / 4;
    const mb = b.reduce((s, x) => s + x, 0) / 5;
    const grand = (ma * 4 + mb * 5) / 9;
    const ssb = 4 * (ma - grand) ** 2 + 5 * (mb - grand) ** 2;
    const ssw = a.reduce((s, x) => s + (x - ma) ** 2, 0) + b.reduce((s, x) => s + (x - mb) ** 2, 0);
    expect(d.F).toBeCloseTo(ssb / (ssw / 7), 12);
    expect(d.F).not.toBeCloseTo(m.F, 3);
  });

  it("is unavailable when every group is constant", () => {
    const r = levene(
      [
        { name: "A", values: [3, 3] },
        { name: "B", values: [4, 4, 4] },
      ],
      "median",
    );
    expect(r.available).toBe(false);
  });

  it("two values per group: unavailable, not F ≈ 1e30 (arithmetic: both values lie |x₁ − x₂|/2 from the mean and from the median, so SS within is exactly 0)", () => {
    const groups = [
      { name: "A", values: [4.1, 5.3] },
      { name: "B", values: [6.2, 9.9] },
      { name: "C", values: [1.7, 2.0] },
    ];
    for (const center of ["mean", "median"] as const) {
      const r = levene(groups, center);
      expect(r.available).toBe(false);
      if (!r.available)
        expect(r.reason).toMatch(/absolute deviations from the group (mean|median) are equal/);
    }
    // Large offsets and many groups: still zero up to rounding.
    const far = Array.from({ length: 6 }, (_, g) => ({
      name: `G${g}`,
      values: [`100000.${g + 1}7`, `10000${g}.93`],
    }));
    expect(levene(far, "mean").available).toBe(false);
  });

  it("a group of three keeps the test available (the deviations then differ within the group)", () => {
    const r = levene(
      [
        { name: "A", values: [4.1, 5.3] },
        { name: "B", values: [6.2, 9.9, 7.0] },
        { name: "C", values: [1.7, 2.0] },
      ],
      "mean",
    );
    if (!r.available) throw new Error(r.reason);
    expect(r.F).toBeLessThan(1e6);
  });
});
