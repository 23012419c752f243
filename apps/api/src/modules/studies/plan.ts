import type { PlanSettings } from "@waymark/contract";
import { posthocFamilyFor, type Comparisons, type OmnibusTest, type PosthocFamily } from "@waymark/stats";
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
 * The test the plan expects before any data are seen: ordinal outcomes go to Kruskal–Wallis;
 * otherwise the policy's first choice. The data's checks may still move it (the recommendation).
 */
export function plannedTest(plan: PlanSettings, design: DesignAnswers): OmnibusTest {
  if (design.scale === "ordinal") return "kruskal-wallis";
  return plan.policy === "welch-first" ? "welch" : "anova";
}

export function comparisonsOf(design: DesignAnswers): Comparisons {
  return design.comparisons === "vs-control" ? "vs-control" : "all-pairs";
}

/** The post-hoc family (an id) matched to an omnibus test and the planned comparisons. */
export function matchedPosthoc(test: OmnibusTest, comparisons: Comparisons): PosthocFamily {
  return posthocFamilyFor(test, comparisons);
}
