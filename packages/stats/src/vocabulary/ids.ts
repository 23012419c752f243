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
