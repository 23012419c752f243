/**
 * The identifiers every package shares: records, API bodies and the engine's options store
 * these ids, never display strings. Each list is declared here once; types are derived from it.
 */

/** The omnibus tests Waymark runs. */
export const OMNIBUS_TESTS = ["anova", "welch", "kruskal-wallis"] as const;
export type OmnibusTest = (typeof OMNIBUS_TESTS)[number];

/** The post-hoc families; `posthocFamilyFor` says which one goes with which test. */
export const POSTHOC_FAMILIES = [
  "tukey-kramer",
  "games-howell",
  "dunn",
  "dunnett",
  "welch-vs-control-holm",
  "dunn-vs-control",
] as const;
export type PosthocFamily = (typeof POSTHOC_FAMILIES)[number];

/** What a study asks of a continuous outcome: equal averages, or which group tends to have larger values. */
export const OUTCOME_QUESTIONS = ["means", "larger-values"] as const;
export type OutcomeQuestion = (typeof OUTCOME_QUESTIONS)[number];

/** Whether the plan puts about the same number of units in every group. */
export const PLANNED_SIZES = ["equal", "unequal"] as const;
export type PlannedSizes = (typeof PLANNED_SIZES)[number];

/** Every omnibus test reported, the primary one and the sensitivity analyses beside it. */
export const SENSITIVITY_TESTS = [...OMNIBUS_TESTS, "trimmed-means"] as const;
export type SensitivityTest = (typeof SENSITIVITY_TESTS)[number];

/** How the power of the plan's primary test is computed. */
export const POWER_METHODS = ["noncentral-f", "noncentral-f-welch-approximation", "simulation"] as const;
export type PowerMethod = (typeof POWER_METHODS)[number];

/** Multiplicity adjustments for p-value-based comparisons. */
export const ADJUSTMENTS = ["holm", "bonferroni", "bh"] as const;
export type Adjustment = (typeof ADJUSTMENTS)[number];

/** The organization's test policy. */
export const POLICIES = ["classic-first", "welch-first"] as const;
export type Policy = (typeof POLICIES)[number];

/** Measurement scale of the outcome. */
export const SCALES = ["continuous", "ordinal"] as const;
export type Scale = (typeof SCALES)[number];

/** Which comparisons follow the omnibus test. */
export const COMPARISONS = ["all-pairs", "vs-control"] as const;
export type Comparisons = (typeof COMPARISONS)[number];

/** The assumption checks the engine runs. */
export const CHECKS = [
  "shapiro-wilk",
  "levene",
  "brown-forsythe",
  "bartlett",
  "sd-ratio",
  "outliers",
] as const;
export type CheckId = (typeof CHECKS)[number];
