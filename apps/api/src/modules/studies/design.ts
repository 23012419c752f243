import type { DesignAnswers } from "@waymark/contract";

/** The analyst's answers to the design questions; each may still be open or "unsure". */
export type { DesignAnswers };
export { DESIGN_QUESTIONS } from "@waymark/contract";

/** Why a design falls outside what Waymark analyses, or null when it is in scope. */
export function outOfScopeReason(d: DesignAnswers): string | null {
  if (d.independence === "paired") {
    return "The same units are measured in more than one group (repeated or paired measures). Waymark compares independent groups only; the usual methods for this design are repeated-measures ANOVA, linear mixed models, or the Friedman test for ordinal outcomes.";
  }
  return null;
}

/**
 * Which answer still blocks the plan, or null when the design is complete. "Not sure" is an
 * answer for scale, control and assignment (Waymark then takes the cautious reading) but not
 * for independence, which decides whether the methods apply at all.
 */
export function missingDesignAnswer(d: DesignAnswers, hasControlLevel: boolean): string | null {
  if (!d.independence) return "Answer whether the groups are independent.";
  if (d.independence === "unsure")
    return "Find out whether each unit appears in only one group: the methods here need independent groups.";
  if (!d.scale) return "Answer whether the outcome is continuous or ordinal.";
  if (d.scale !== "ordinal" && !d.question)
    return "Answer whether the study asks about average amounts or about which group tends to have larger values.";
  if (!d.groupSizes) return "Answer whether the plan puts the same number of units in every group.";
  if (!d.hasControl) return "Answer whether one group is a control.";
  if (d.hasControl === "yes" && !hasControlLevel) return "Name the control level in the study details.";
  if (!d.comparisons) return "Answer which comparisons you plan.";
  if (d.comparisons === "vs-control" && !hasControlLevel)
    return "Comparisons against a control need a control level in the study details.";
  if (!d.assignment) return "Answer how the units were assigned to groups.";
  return null;
}
