import type { Unavailable } from "../types/group-summary.js";
import { formatP, formatStat, formatUnit } from "../reporting/format.js";
import {
  DEFAULT_ALPHA,
  LARGE_GROUP_N,
  SD_RATIO_LIMIT,
  UNBALANCED_N_RATIO,
  VERY_SMALL_GROUP_N,
} from "./thresholds.js";

import type { Comparisons, OmnibusTest, Policy, PosthocFamily, Scale } from "../vocabulary/ids.js";
import { posthocFamilyFor } from "../vocabulary/posthoc-family.js";

export type { OmnibusTest };
/** The post-hoc family (see vocabulary/ids.ts). */
export type PosthocMethod = PosthocFamily;

/** The study design, as answered in the plan. */
export interface DesignAnswers {
  /** true for independent groups; false or "paired" for repeated measures / matched data. */
  independent: boolean | "paired";
  scale: Scale;
  k: number;
  control?: string;
  comparisons: Comparisons;
  alpha?: number;
  policy?: Policy;
}

/** The assumption checks the choice looks at; anything unavailable is passed as such. */
export interface CheckResults {
  groupSizes: readonly number[];
  /** Shapiro–Wilk on the pooled within-group residuals. */
  shapiroWilkResiduals?: { p: number; W?: number } | Unavailable;
  /** Brown–Forsythe (median-centred Levene) test. */
  brownForsythe?: { p: number; F?: number } | Unavailable;
  sdRatio?: number | Unavailable;
  /** Number of values beyond the 3-IQR fences, over all groups. */
  extremeOutliers?: number;
}

export interface Recommendation {
  test: OmnibusTest | "out-of-scope";
  posthoc: PosthocMethod | "none";
  reasons: string[];
  caveats: string[];
  alternatives: { test: OmnibusTest; whyNot: string }[];
}

function isAvailable<T extends object>(x: T | Unavailable | undefined): x is T {
  return x !== undefined && !("available" in x && x.available === false);
}

/**
 * Chooses the omnibus test and its matching post-hoc family from the design and the checks.
 * Rules, in order:
 * 1. Matched or repeated measurements → out of scope (they need repeated-measures ANOVA or
 *    mixed models, or the Friedman test).
 * 2. Kruskal–Wallis when the outcome is ordinal, when there are extreme outliers (beyond
 *    3 IQR), or when residuals are clearly non-normal (Shapiro–Wilk p < α) and some group is
 *    below LARGE_GROUP_N; with large groups the parametric test is kept (central limit theorem).
 * 3. Policy "classic-first": classic ANOVA unless variances differ (Brown–Forsythe p < α or
 *    SD ratio > SD_RATIO_LIMIT) → Welch. Policy "welch-first": Welch's ANOVA whenever rule 2
 *    does not apply (Delacre, Leys, Mora & Lakens 2019, International Review of Social
 *    Psychology 32(1):13 — Welch keeps its error rate under unequal variances and loses
 *    little when they are equal).
 * Post-hoc: ANOVA → Tukey–Kramer (all pairs) / Dunnett (vs control); Welch → Games–Howell /
 * Welch t vs control with Holm; Kruskal–Wallis → Dunn / Dunn vs control.
 * Every reason is a sentence carrying the numbers that triggered it.
 * Example: recommendTest({ independent: true, scale: "continuous", k: 3, comparisons: "all-pairs" },
 *   { groupSizes: [20, 20, 20], sdRatio: 3.1 }).test → "welch".
 * Cost: O(k). Pure: no I/O, no randomness.
 */
export function recommendTest(design: DesignAnswers, checks: CheckResults): Recommendation {
  const alpha = design.alpha ?? DEFAULT_ALPHA;
  const policy = design.policy ?? "classic-first";
  const reasons: string[] = [];
  const caveats: string[] = [];
  const sizes = checks.groupSizes;
  const minN = sizes.length ? Math.min(...sizes) : 0;
  const maxN = sizes.length ? Math.max(...sizes) : 0;

  if (design.independent !== true) {
    return {
      test: "out-of-scope",
      posthoc: "none",
      reasons: [
        "The measurements are matched or repeated on the same units, so the groups are not independent; that design needs repeated-measures ANOVA or a mixed model, or the Friedman test for ranks, which this analysis does not cover.",
      ],
      caveats: [],
      alternatives: [],
    };
  }

  if (design.k === 2) {
    caveats.push(
      "With two groups a two-sample test (Student's or Welch's t, or Mann–Whitney) is the usual frame; the one-way tests give the same answer here (F equals t squared).",
    );
  }
  if (minN > 0 && minN < VERY_SMALL_GROUP_N) {
    caveats.push(
      `The smallest group has ${minN} values (below ${VERY_SMALL_GROUP_N}), so the assumption checks have little power and can miss real departures.`,
    );
  }

  // Variance evidence, used by both policies.
  const bf = checks.brownForsythe;
  const ratio = checks.sdRatio;
  const bfSignificant = isAvailable(bf) && bf.p < alpha;
  const ratioLarge = typeof ratio === "number" && ratio > SD_RATIO_LIMIT;
  const varianceReasons: string[] = [];
  if (ratioLarge)
    varianceReasons.push(
      `The largest SD is ${formatStat(ratio, 1)} times the smallest (above the ${SD_RATIO_LIMIT.toFixed(1)} rule of thumb), so equal variances cannot be assumed.`,
    );
  if (bfSignificant)
    varianceReasons.push(
      `The Brown–Forsythe test finds unequal variances (p ${formatP(bf.p)}, below α = ${formatUnit(alpha)}).`,
    );
  const variancesDiffer = varianceReasons.length > 0;

  // Rank-test triggers.
  const rankReasons: string[] = [];
  if (design.scale === "ordinal")
    rankReasons.push(
      "The outcome is ordinal, so means and variances are not meaningful and a rank test fits the scale.",
    );
  const extreme = checks.extremeOutliers ?? 0;
  if (extreme > 0) {
    rankReasons.push(
      `${extreme} value${extreme === 1 ? " lies" : "s lie"} beyond 3 IQR from the quartiles (extreme outliers), which would dominate means and variances.`,
    );
  }
  const sw = checks.shapiroWilkResiduals;
  const nonNormal = isAvailable(sw) && sw.p < alpha;
  if (nonNormal && minN < LARGE_GROUP_N) {
    rankReasons.push(
      `The residuals are clearly non-normal (Shapiro–Wilk p ${formatP(sw.p)}, below α = ${formatUnit(alpha)}) and the smallest group has only ${minN} values (below ${LARGE_GROUP_N}), too few to rely on the central limit theorem.`,
    );
  }

  let test: OmnibusTest;
  if (rankReasons.length > 0) {
    test = "kruskal-wallis";
    reasons.push(...rankReasons);
    if (variancesDiffer && design.scale !== "ordinal") {
      caveats.push(
        "The group spreads differ, so the Kruskal–Wallis test compares whole distributions; a significant result need not mean that the medians differ.",
      );
    }
  } else {
    if (nonNormal) {
      reasons.push(
        `The residuals depart from normality (Shapiro–Wilk p ${formatP(sw.p)}), but every group has at least ${LARGE_GROUP_N} values, so the group means are close to normal (central limit theorem) and a parametric test is kept.`,
      );
    }
    if (policy === "welch-first") {
      test = "welch";
      reasons.push(
        "Welch's ANOVA is the default under the welch-first policy: it keeps its error rate when variances differ and loses little power when they are equal (Delacre, Leys, Mora & Lakens 2019).",
      );
      reasons.push(...varianceReasons);
    } else if (variancesDiffer) {
      test = "welch";
      reasons.push(...varianceReasons);
    } else {
      test = "anova";
      const parts: string[] = [];
      if (typeof ratio === "number")
        parts.push(
          `the largest SD is ${formatStat(ratio, 1)} times the smallest (within the ${SD_RATIO_LIMIT.toFixed(1)} rule of thumb)`,
        );
      if (isAvailable(bf))
        parts.push(`the Brown–Forsythe test does not find unequal variances (p ${formatP(bf.p)})`);
      reasons.push(
        parts.length > 0
          ? `Equal variances are plausible: ${parts.join(" and ")}, so classic one-way ANOVA is used.`
          : "No check speaks against equal variances, so classic one-way ANOVA is used.",
      );
      if (isAvailable(sw) && !nonNormal)
        reasons.push(
          `The residuals show no clear departure from normality (Shapiro–Wilk p ${formatP(sw.p)}).`,
        );
      if (minN > 0 && maxN / minN > UNBALANCED_N_RATIO) {
        caveats.push(
          `Group sizes range from ${minN} to ${maxN}; with unequal sizes classic ANOVA is sensitive to unequal variances, so Welch's ANOVA is worth reporting alongside.`,
        );
      }
    }
  }
  if (!isAvailable(sw) && sw !== undefined)
    caveats.push(`Normality of the residuals could not be checked: ${sw.reason}.`);
  if (!isAvailable(bf) && bf !== undefined)
    caveats.push(`Equality of variances could not be tested: ${bf.reason}.`);

  const posthoc: PosthocMethod = posthocFamilyFor(test, design.comparisons);

  const alternatives: { test: OmnibusTest; whyNot: string }[] = [];
  for (const other of ["anova", "welch", "kruskal-wallis"] as const) {
    if (other === test) continue;
    let whyNot: string;
    if (other === "anova")
      whyNot = variancesDiffer
        ? "It assumes equal variances, which the checks do not support."
        : rankReasons.length
          ? "It assumes roughly normal data without extreme outliers, which the checks do not support."
          : "Welch's ANOVA was preferred by policy; classic ANOVA gives similar answers when variances are equal.";
    else if (other === "welch")
      whyNot = rankReasons.length
        ? "It still compares means, which the scale, outliers or shape make unreliable here."
        : "With equal variances it answers the same question with slightly less power.";
    else
      whyNot =
        "It compares rank distributions rather than means and loses some power when the parametric assumptions hold.";
    alternatives.push({ test: other, whyNot });
  }
  reasons.push(`Post-hoc comparisons: ${posthocSentence(posthoc, design.control)}`);
  return { test, posthoc, reasons, caveats, alternatives };
}

function posthocSentence(p: PosthocMethod, control: string | undefined): string {
  const c = control ? `'${control}'` : "the control group";
  switch (p) {
    case "tukey-kramer":
      return "Tukey–Kramer for all pairs, matching the pooled-variance ANOVA.";
    case "dunnett":
      return `Dunnett's comparisons of each group with ${c}, matching the pooled-variance ANOVA.`;
    case "games-howell":
      return "Games–Howell for all pairs, which like Welch's ANOVA does not assume equal variances.";
    case "welch-vs-control-holm":
      return `Welch t tests of each group against ${c} with Holm's adjustment, which do not assume equal variances.`;
    case "dunn":
      return "Dunn's rank comparisons for all pairs, matching the Kruskal–Wallis test.";
    case "dunn-vs-control":
      return `Dunn's rank comparisons of each group with ${c}, matching the Kruskal–Wallis test.`;
  }
}
