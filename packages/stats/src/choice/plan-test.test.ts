import { describe, expect, it } from "vitest";
import { planTest, type TestPlanDesign } from "./plan-test.js";
import { posthocFamilyFor as posthocFor } from "../vocabulary/posthoc-family.js";

const means: TestPlanDesign = {
  independent: true,
  scale: "continuous",
  question: "means",
  comparisons: "all-pairs",
  policy: "welch-first",
  plannedSizes: "unequal",
};

// Rules stated in planTest's doc comment, with their sources there (Delacre et al. 2019;
// Fagerland & Sandvik 2009; Zimmerman 2004). These tests hold the stated properties.
describe("planTest: the plan decides the primary test from the design alone", () => {
  it("puts a means question on Welch's ANOVA with Games–Howell", () => {
    const p = planTest(means);
    expect(p).toMatchObject({ test: "welch", posthoc: "games-howell", rule: null });
  });

  it("puts an ordinal outcome or a larger-values question on Kruskal–Wallis with Dunn", () => {
    expect(planTest({ ...means, scale: "ordinal" })).toMatchObject({
      test: "kruskal-wallis",
      posthoc: "dunn",
    });
    expect(planTest({ ...means, question: "larger-values" })).toMatchObject({
      test: "kruskal-wallis",
      posthoc: "dunn",
    });
  });

  it("keeps classic ANOVA under classic-first only for planned equal sizes, and names its one rule", () => {
    const balanced = planTest({ ...means, policy: "classic-first", plannedSizes: "equal" });
    expect(balanced.test).toBe("anova");
    expect(balanced.rule?.to).toBe("welch");
    expect(balanced.reasons.map((r) => r.code)).toContain("plan.switch-rule");
    const unbalanced = planTest({ ...means, policy: "classic-first", plannedSizes: "unequal" });
    expect(unbalanced).toMatchObject({ test: "welch", rule: null });
    expect(unbalanced.reasons.map((r) => r.code)).toContain("plan.classic-unbalanced");
  });

  it("never names a rank test for a means question, whatever the policy", () => {
    for (const policy of ["classic-first", "welch-first"] as const)
      for (const plannedSizes of ["equal", "unequal"] as const)
        expect(planTest({ ...means, policy, plannedSizes }).test).not.toBe("kruskal-wallis");
  });

  it("leaves matched designs out of scope", () => {
    expect(planTest({ ...means, independent: "paired" })).toMatchObject({
      test: "out-of-scope",
      posthoc: "none",
    });
  });

  it("matches each test with its post-hoc family for both comparison types (common practice)", () => {
    expect(posthocFor("anova", "vs-control")).toBe("dunnett");
    expect(posthocFor("welch", "vs-control")).toBe("welch-vs-control-holm");
    expect(posthocFor("kruskal-wallis", "vs-control")).toBe("dunn-vs-control");
    expect(posthocFor("anova", "all-pairs")).toBe("tukey-kramer");
  });
});
