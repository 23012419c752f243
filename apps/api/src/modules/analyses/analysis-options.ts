import type { AnalyzeOptions } from "@waymark/stats";
import type { Study } from "../studies/study.entity.js";
import { comparisonsOf, testPlanOf } from "../studies/plan.js";

/** The engine options that a study's locked plan and design answers imply. */
export function analysisOptions(study: Study): AnalyzeOptions {
  const comparisons = comparisonsOf(study.design);
  const plan = testPlanOf(study.plan, study.design);
  return {
    alpha: study.plan.alpha,
    adjust: study.plan.adjust,
    policy: study.plan.policy,
    // "Not sure" about the scale takes the cautious, rank-based reading only when stated ordinal.
    scale: study.design.scale === "ordinal" ? "ordinal" : "continuous",
    comparisons: comparisons === "vs-control" && study.controlLevel ? "vs-control" : "all-pairs",
    ...(study.controlLevel && study.design.hasControl !== "no" ? { control: study.controlLevel } : {}),
    independent: study.design.independence === "paired" ? "paired" : true,
    question: study.design.question === "larger-values" ? "larger-values" : "means",
    plannedSizes: study.design.groupSizes === "equal" ? "equal" : "unequal",
    // The locked plan's stored decision; the engine applies only the rule the plan names.
    ...(plan.test !== "out-of-scope" ? { plan } : {}),
    // The error-rate simulation is seeded by the study, so a re-run reproduces it.
    errorRateCheck: { seed: study.id },
  };
}
