import { planTest, type OutOfScopePlan, type PowerMethod, type TestPlan } from "@waymark/stats";
import type { DesignAnswers } from "./design.js";

export type TestPolicy = "classic-first" | "welch-first";
export type Adjustment = "holm" | "bonferroni" | "bh";
export type OmnibusTest = "anova" | "welch" | "kruskal-wallis";

/** The analysis plan; frozen once `planLockedAt` is set on the study. */
export interface PlanSettings {
  policy: TestPolicy;
  adjust: Adjustment;
  alpha: number;
  power: PlanPower | null;
  /** The primary test decided from the design, stored when the plan is locked. */
  testPlan?: TestPlan;
}

export interface PlanPower {
  effectF: number;
  targetPower: number;
  nPerGroup: number;
  achievedPower: number;
  /** How the power of the primary test was computed (noncentral F, its Welch approximation, or simulation). */
  method?: PowerMethod;
  note?: string;
}

export const DEFAULT_PLAN: PlanSettings = {
  policy: "classic-first",
  adjust: "holm",
  alpha: 0.05,
  power: null,
};

/**
 * The primary test and its post-hoc family as the plan decides them before any data are seen.
 * A locked plan keeps the decision it stored at lock time; before that it follows the answers.
 * "Not sure" takes the cautious reading: a question about means, unequal planned sizes.
 */
export function testPlanOf(plan: PlanSettings, design: DesignAnswers): TestPlan | OutOfScopePlan {
  if (plan.testPlan) return plan.testPlan;
  return planTest({
    independent: design.independence === "paired" ? "paired" : true,
    scale: design.scale === "ordinal" ? "ordinal" : "continuous",
    question: design.question === "larger-values" ? "larger-values" : "means",
    comparisons: comparisonsOf(design),
    policy: plan.policy,
    plannedSizes: design.groupSizes === "equal" ? "equal" : "unequal",
  });
}

export function comparisonsOf(design: DesignAnswers): "all-pairs" | "vs-control" {
  return design.comparisons === "vs-control" ? "vs-control" : "all-pairs";
}
