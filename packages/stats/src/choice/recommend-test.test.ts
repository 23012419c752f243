import { describe, expect, it } from "vitest";
import { recommendTest, type DesignAnswers } from "./recommend-test.js";

const design: DesignAnswers = { independent: true, scale: "continuous", k: 3, comparisons: "all-pairs" };
const calm = {
  groupSizes: [20, 20, 20],
  shapiroWilkResiduals: { p: 0.4 },
  brownForsythe: { p: 0.6 },
  sdRatio: 1.3,
  extremeOutliers: 0,
};

describe("recommendTest", () => {
  it("classic-first: classic ANOVA and Tukey–Kramer when nothing speaks against it", () => {
    const r = recommendTest(design, calm);
    expect(r).toMatchObject({ test: "anova", posthoc: "tukey-kramer" });
    expect(r.reasons[0]).toContain("1.3 times");
    expect(r.alternatives.map((a) => a.test)).toEqual(["welch", "kruskal-wallis"]);
  });

  it("moves to Welch when the SD ratio exceeds 2, saying so with the numbers", () => {
    const r = recommendTest(design, { ...calm, sdRatio: 3.1 });
    expect(r).toMatchObject({ test: "welch", posthoc: "games-howell" });
    expect(r.reasons).toContain(
      "The largest SD is 3.1 times the smallest (above the 2.0 rule of thumb), so equal variances cannot be assumed.",
    );
  });

  it("moves to Welch when Brown–Forsythe is significant", () => {
    const r = recommendTest(design, { ...calm, brownForsythe: { p: 0.01 } });
    expect(r.test).toBe("welch");
    expect(r.reasons.join(" ")).toContain("p = .010");
  });

  it("uses Kruskal–Wallis for ordinal data, extreme outliers, or non-normality with small groups", () => {
    expect(recommendTest({ ...design, scale: "ordinal" }, calm).test).toBe("kruskal-wallis");
    expect(recommendTest(design, { ...calm, extremeOutliers: 2 }).reasons[0]).toContain(
      "2 values lie beyond 3 IQR",
    );
    const small = recommendTest(design, {
      ...calm,
      groupSizes: [8, 9, 10],
      shapiroWilkResiduals: { p: 0.002 },
    });
    expect(small).toMatchObject({ test: "kruskal-wallis", posthoc: "dunn" });
  });

  it("keeps the parametric test for non-normal residuals when every group is large (CLT)", () => {
    const r = recommendTest(design, {
      ...calm,
      groupSizes: [80, 90, 85],
      shapiroWilkResiduals: { p: 0.001 },
    });
    expect(r.test).toBe("anova");
    expect(r.reasons[0]).toContain("central limit theorem");
  });

  it("welch-first: Welch unless a rank test is called for", () => {
    expect(recommendTest({ ...design, policy: "welch-first" }, calm)).toMatchObject({ test: "welch" });
    expect(recommendTest({ ...design, policy: "welch-first", scale: "ordinal" }, calm).test).toBe(
      "kruskal-wallis",
    );
  });

  it("matches post-hoc families to comparisons against a control", () => {
    const vs = { ...design, comparisons: "vs-control" as const, control: "Placebo" };
    expect(recommendTest(vs, calm).posthoc).toBe("dunnett");
    expect(recommendTest(vs, { ...calm, sdRatio: 4 }).posthoc).toBe("welch-vs-control-holm");
    expect(recommendTest({ ...vs, scale: "ordinal" }, calm).posthoc).toBe("dunn-vs-control");
  });

  it("declares paired or repeated designs out of scope, naming the usual family", () => {
    const r = recommendTest({ ...design, independent: "paired" }, calm);
    expect(r.test).toBe("out-of-scope");
    expect(r.reasons[0]).toMatch(/repeated-measures ANOVA.*Friedman/);
  });

  it("adds a caveat for two groups", () => {
    expect(recommendTest({ ...design, k: 2 }, { ...calm, groupSizes: [20, 20] }).caveats[0]).toContain(
      "two-sample test",
    );
  });
});
