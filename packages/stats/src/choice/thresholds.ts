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
