import { formatP, formatStat } from "../reporting/format.js";
import type { TestDecision } from "./decide-test.js";
import type { CodedText } from "../vocabulary/coded-text.js";
import { note } from "./note.js";
import { LARGE_GROUP_N, SD_RATIO_LIMIT } from "./thresholds.js";

/** The check results that can speak against the plan's test. */
export interface CheckEvidence {
  alpha: number;
  groups: readonly { name: string; n: number; sd: number }[];
  /** Shapiro–Wilk within each group (equivalently on its standardized residuals: W is location-scale invariant). */
  normality: readonly ({ group: string; p: number } | { group: string; available: false })[];
  /** Values flagged as far out in each group, by fences that account for the group's size. */
  outliers: readonly { group: string; count: number }[];
}

/**
 * Where a check speaks against the plan's test, a warning that says what it means and which
 * sensitivity analysis answers it. Checks inform; they never change the primary test.
 * Example: a Welch plan with a group of 8 whose Shapiro–Wilk p = .003 → one
 * "check.shape-against-means" note.
 * Cost: O(k). Pure.
 */
export function checkWarnings(decision: TestDecision, e: CheckEvidence): CodedText[] {
  if (decision.test === "out-of-scope") return [];
  const out: CodedText[] = [];
  const meansTest = decision.test === "anova" || decision.test === "welch";
  if (meansTest) {
    const sizes = new Map(e.groups.map((g) => [g.name, g.n]));
    const departs = e.normality.filter(
      (x): x is { group: string; p: number } =>
        "p" in x && x.p < e.alpha && (sizes.get(x.group) ?? 0) < LARGE_GROUP_N,
    );
    for (const d of departs) {
      out.push(
        note(
          "check.shape-against-means",
          { group: d.group, p: d.p, n: sizes.get(d.group) ?? 0 },
          `The values in '${d.group}' depart from a normal shape (Shapiro–Wilk p ${formatP(d.p)}, n = ${sizes.get(d.group)}); with so few values a test of means leans on that shape. The sensitivity analyses show whether the conclusion depends on it.`,
        ),
      );
    }
    for (const o of e.outliers.filter((x) => x.count > 0)) {
      out.push(
        note(
          "check.outliers-against-means",
          { group: o.group, count: o.count },
          `${o.count === 1 ? "One value" : `${o.count} values`} in '${o.group}' ${o.count === 1 ? "lies" : "lie"} far from the rest for a group of its size. Check ${o.count === 1 ? "it" : "them"} against the records; a far value pulls the mean, and the test on 20% trimmed means beside the primary one shows whether ${o.count === 1 ? "it drives" : "they drive"} the result.`,
        ),
      );
    }
  } else {
    const sds = e.groups.map((g) => g.sd).filter((s) => s > 0);
    const ratio = sds.length === e.groups.length ? Math.max(...sds) / Math.min(...sds) : null;
    if (ratio !== null && ratio > SD_RATIO_LIMIT) {
      out.push(
        note(
          "check.spread-against-ranks",
          { sdRatio: ratio },
          `The spreads differ (the largest SD is ${formatStat(ratio, 1)} times the smallest), so a significant Kruskal–Wallis result says that some group tends to have larger values, not that the medians differ.`,
        ),
      );
    }
  }
  return out;
}
