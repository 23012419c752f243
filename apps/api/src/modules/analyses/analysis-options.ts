import type { AnalyzeOptions } from "@waymark/stats";
import type { Study } from "../studies/study.entity.js";
import { comparisonsOf } from "../studies/plan.js";

/** The engine options that a study's locked plan and design answers imply. */
export function analysisOptions(study: Study): AnalyzeOptions {
  const comparisons = comparisonsOf(study.design);
  return {
    alpha: study.plan.alpha,
    adjust: study.plan.adjust,
    policy: study.plan.policy,
    // "Not sure" about the scale takes the cautious, rank-based reading only when stated ordinal.
    scale: study.design.scale === "ordinal" ? "ordinal" : "continuous",
    comparisons: comparisons === "vs-control" && study.controlLevel ? "vs-control" : "all-pairs",
    ...(study.controlLevel && study.design.hasControl !== "no" ? { control: study.controlLevel } : {}),
    independent: study.design.independence === "paired" ? "paired" : true,
  };
}
