import type { DesignAnswers } from "./design.js";

export type TestPolicy = "classic-first" | "welch-first";
export type Adjustment = "holm" | "bonferroni" | "bh";
export type OmnibusTest = "anova" | "welch" | "kruskal-wallis";

/** The analysis plan; frozen once `planLockedAt` is set on the study. */
export interface PlanSettings {
  policy: TestPolicy;
  adjust: Adjustment;
  alpha: number;
  power: { effectF: number; targetPower: number; nPerGroup: number; achievedPower: number } | null;
}

export const DEFAULT_PLAN: PlanSettings = {
  policy: "classic-first",
  adjust: "holm",
  alpha: 0.05,
  power: null,
};

/**
 * The test the plan expects before any data are seen: ordinal outcomes go to Kruskal–Wallis;
 * otherwise the policy's first choice. The data's checks may still move it (the recommendation).
 */
export function plannedTest(plan: PlanSettings, design: DesignAnswers): OmnibusTest {
  if (design.scale === "ordinal") return "kruskal-wallis";
  return plan.policy === "welch-first" ? "welch" : "anova";
}

export function comparisonsOf(design: DesignAnswers): "all-pairs" | "vs-control" {
  return design.comparisons === "vs-control" ? "vs-control" : "all-pairs";
}

/** The post-hoc method matched to an omnibus test and the planned comparisons. */
export function matchedPosthoc(test: OmnibusTest, comparisons: "all-pairs" | "vs-control"): string {
  if (comparisons === "vs-control") {
    return test === "anova"
      ? "Dunnett"
      : test === "welch"
        ? "Welch t-tests against the control, Holm-adjusted"
        : "Dunn against the control";
  }
  return test === "anova" ? "Tukey–Kramer HSD" : test === "welch" ? "Games–Howell" : "Dunn";
}
