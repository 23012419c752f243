import { describe, expect, it } from "vitest";
import { analyze } from "../analyze.js";
import { decideTest } from "./decide-test.js";
import { planTest } from "./plan-test.js";

const classicPlan = planTest({
  independent: true,
  scale: "continuous",
  question: "means",
  comparisons: "all-pairs",
  policy: "classic-first",
  plannedSizes: "equal",
});
const none = { anova: null, welch: null, "kruskal-wallis": null };
const groups = (spec: [number, number][]) => spec.map(([n, sd], i) => ({ name: `G${i + 1}`, n, sd }));

describe("decideTest: only the plan's named rule moves the test", () => {
  it("keeps classic ANOVA while sizes and spreads stay within the rule", () => {
    const d = decideTest(classicPlan, {
      groups: groups([
        [10, 1],
        [10, 1.2],
        [10, 1.3],
      ]),
      comparisons: "all-pairs",
      unavailable: none,
    });
    expect(d).toMatchObject({ test: "anova", planned: "anova", ruleApplied: false, computable: true });
  });

  it("moves to Welch's ANOVA when the SD ratio or the size ratio passes the rule", () => {
    const bySpread = decideTest(classicPlan, {
      groups: groups([
        [10, 1],
        [10, 1.6],
        [10, 1],
      ]),
      comparisons: "all-pairs",
      unavailable: none,
    });
    expect(bySpread).toMatchObject({ test: "welch", posthoc: "games-howell", ruleApplied: true });
    const bySize = decideTest(classicPlan, {
      groups: groups([
        [8, 1],
        [12, 1],
        [10, 1],
      ]),
      comparisons: "vs-control",
      unavailable: none,
    });
    expect(bySize).toMatchObject({ test: "welch", posthoc: "welch-vs-control-holm", ruleApplied: true });
  });

  it("never presents a test it cannot compute as runnable (zero-variance group)", () => {
    // Welch's ANOVA divides by each group's variance (Welch 1951, Biometrika 38, 330–336): a group
    // of identical values leaves it undefined.
    const r = analyze({
      groups: [
        { name: "A", values: [5, 5, 5, 5] },
        { name: "B", values: [4.1, 5.2, 6.3, 5.5] },
        { name: "C", values: [6.1, 7.4, 5.9, 6.6] },
      ],
      options: { policy: "welch-first" },
    });
    expect(r.recommendation.test).toBe("welch");
    expect(r.recommendation.computable).toBe(false);
    expect(r.recommendation.reasons.map((x) => x.code)).toContain("decision.not-computable");
    expect(r.welch).toMatchObject({ available: false });
  });

  it("does not move a means question to Kruskal–Wallis for an extreme outlier or skewed data", () => {
    const r = analyze({
      groups: [
        { name: "A", values: [1.1, 1.3, 0.9, 1.0, 1.2, 1.1, 30] },
        { name: "B", values: [2.1, 2.3, 1.9, 2.0, 2.2, 2.1, 2.4] },
        { name: "C", values: [1.5, 1.4, 1.6, 1.3, 1.7, 1.5, 1.6] },
      ],
      options: { policy: "welch-first" },
    });
    expect(r.recommendation.test).toBe("welch");
  });
});

describe("checkWarnings: the checks inform, beside the plan's test", () => {
  it("warns about a far value under a means test and points to the trimmed-means analysis, without moving the test", () => {
    const r = analyze({
      groups: [
        { name: "A", values: [1.1, 1.3, 0.9, 1.0, 1.2, 1.1, 30] },
        { name: "B", values: [2.1, 2.3, 1.9, 2.0, 2.2, 2.1, 2.4] },
        { name: "C", values: [1.5, 1.4, 1.6, 1.3, 1.7, 1.5, 1.6] },
      ],
      options: { policy: "welch-first" },
    });
    expect(r.recommendation.test).toBe("welch");
    const codes = r.checkWarnings.map((w) => w.code);
    expect(codes).toContain("check.outliers-against-means");
    expect(r.checkWarnings.find((w) => w.code === "check.outliers-against-means")!.text).toMatch(
      /trimmed means/,
    );
  });

  it("tells a rank plan with unequal spreads what a significant result does and does not mean", () => {
    // Fagerland & Sandvik 2009 (Statistics in Medicine 28, 1487–1497): with unequal spreads the
    // Kruskal–Wallis test is not a test of medians.
    const r = analyze({
      groups: [
        { name: "A", values: [10, 11, 9, 10.5, 9.5, 10.2] },
        { name: "B", values: [4, 16, 8, 13, 2, 19] },
        { name: "C", values: [10.1, 10.3, 9.8, 10.0, 10.4, 9.9] },
      ],
      options: { question: "larger-values" },
    });
    expect(r.recommendation.test).toBe("kruskal-wallis");
    expect(r.checkWarnings.map((w) => w.code)).toEqual(["check.spread-against-ranks"]);
  });
});

describe("the zero-variance warning says what still runs", () => {
  it("names Welch's ANOVA and Bartlett as unavailable and keeps Games–Howell for pairs with some spread", () => {
    // Games & Howell (1976): each pair's standard error is √(s_a²/n_a + s_b²/n_b), defined when one
    // of the two groups varies; only a pair of two constant groups has no comparison.
    const r = analyze({
      groups: [
        { name: "A", values: [5, 5, 5, 5] },
        { name: "B", values: [4.1, 5.2, 6.3, 5.5] },
        { name: "C", values: [6.1, 7.4, 5.9, 6.6] },
      ],
      options: { errorRateCheck: false },
    });
    const warning = r.warnings.find((w) => w.startsWith("Zero variance"))!;
    expect(warning).toMatch(/Welch's ANOVA and Bartlett's test cannot run/);
    expect(warning).toMatch(/Games–Howell compares a pair only when at least one of its two groups varies/);
    const gh = r.posthoc.gamesHowell;
    if (!Array.isArray(gh)) throw new Error("Games–Howell should run");
    expect(gh.every((p) => p.available !== false)).toBe(true);
  });
});
