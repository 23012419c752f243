import type { Comparisons, OmnibusTest, PosthocFamily } from "./ids.js";

const FAMILY: Record<OmnibusTest, Record<Comparisons, PosthocFamily>> = {
  anova: { "all-pairs": "tukey-kramer", "vs-control": "dunnett" },
  welch: { "all-pairs": "games-howell", "vs-control": "welch-vs-control-holm" },
  "kruskal-wallis": { "all-pairs": "dunn", "vs-control": "dunn-vs-control" },
};

/**
 * The post-hoc family that matches an omnibus test and the planned comparisons: pooled
 * variance (Tukey–Kramer / Dunnett) after classic ANOVA, separate variances (Games–Howell /
 * Welch t with Holm) after Welch's ANOVA, ranks (Dunn) after Kruskal–Wallis. The one place
 * this rule is written. Example: posthocFamilyFor("welch", "all-pairs") → "games-howell".
 */
export function posthocFamilyFor(test: OmnibusTest, comparisons: Comparisons): PosthocFamily {
  return FAMILY[test][comparisons];
}
