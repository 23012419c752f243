import type { PlanSettings } from "@waymark/contract";
import {
  planTest,
  type Comparisons,
  type OmnibusTest,
  type OutOfScopePlan,
  type TestPlan,
} from "@waymark/stats";
import type { DesignAnswers } from "./design.js";

/** The analysis plan (ids only); frozen once `planLockedAt` is set on the study. */
export type { OmnibusTest, PlanSettings };

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

export function comparisonsOf(design: DesignAnswers): Comparisons {
  return design.comparisons === "vs-control" ? "vs-control" : "all-pairs";
}
