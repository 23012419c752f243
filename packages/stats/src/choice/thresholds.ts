/**
 * Named cut-offs used to choose between classic ANOVA, Welch's ANOVA and Kruskal–Wallis.
 * Each says where it comes from; "common practice" marks rules of thumb without one source.
 */

/** Default significance level for the assumption checks and tests. Common practice (Fisher 1925). */
export const DEFAULT_ALPHA = 0.05;

/** Largest/smallest SD above this means equal variances cannot be assumed. Common practice (rule of thumb). */
export const SD_RATIO_LIMIT = 2;

/**
 * Groups at least this large lean on the central limit theorem: group means are close to
 * normal even when the data are not, so clear non-normality alone does not move the choice
 * to a rank test. Common practice.
 */
export const LARGE_GROUP_N = 30;

/** Groups below this size give every check little power; a caveat says so. Common practice. */
export const VERY_SMALL_GROUP_N = 5;

/** Values beyond this many IQRs from the quartiles are extreme outliers (Tukey 1977, outer fences). */
export const EXTREME_OUTLIER_IQR = 3;

/** Largest/smallest group size above this counts as unbalanced for the caveats. Common practice. */
export const UNBALANCED_N_RATIO = 1.5;

/**
 * A classic-first plan keeps classic ANOVA while the largest SD is at most this many times the
 * smallest. With equal group sizes classic ANOVA holds α near its level up to about this
 * ratio and not beyond (Box 1954, Annals of Mathematical Statistics 25, 290–302, from memory).
 * The rule-then-test procedure's realised error rate is measured by the test-choice benchmark
 * (packages/stats/bench, figures in the README).
 */
export const PLAN_SWITCH_MAX_SD_RATIO = 1.5;

/** …and while the largest group has at most this many times the values of the smallest. Common practice. */
export const PLAN_SWITCH_MAX_SIZE_RATIO = 1.25;
