import { comparisonRows, type AnalysisResult } from "@waymark/stats/result";
import { posthocFamilyFor, type Comparisons, type OmnibusTest } from "@waymark/stats/vocabulary";
import { num, reasonOf } from "@/lib/result-values";

export interface PairView {
  a: string;
  b: string;
  diff: number | null;
  lower: number | null;
  upper: number | null;
  pAdj: number | null;
  effect: number | null;
}

export interface PosthocView {
  rows: PairView[];
  /** What `diff` and its interval measure: a difference of means, or a Hodges–Lehmann shift. */
  centreLabel: "difference" | "shift";
  effectLabel: "r" | "g";
  effectNote: string;
  hasIntervals: boolean;
}

/**
 * The comparisons of the post-hoc family matched to the test and the planned comparisons
 * (posthocFamilyFor), each with the engine's effect size: Hedges' g for the mean-based families,
 * the rank-biserial r for Dunn's test. Returns the reason when the family could not run.
 */
export function posthocView(
  test: OmnibusTest,
  comparisons: Comparisons,
  r: AnalysisResult,
): PosthocView | { unavailable: string } {
  const rows = comparisonRows(r.posthoc, posthocFamilyFor(test, comparisons));
  if (!Array.isArray(rows)) return { unavailable: reasonOf(rows) };
  const rank = test === "kruskal-wallis";
  const view = rows.map((row): PairView =>
    row.available
      ? {
          a: row.a,
          b: row.b,
          // num(): a number analyze() withheld as not finite arrives as Unavailable; show a dash.
          // Rank families: the Hodges–Lehmann shift, with its distribution-free interval.
          diff: num(row.diff ?? row.shift),
          lower: num(row.lower),
          upper: num(row.upper),
          pAdj: num(row.pAdj),
          effect: row.effect.available ? num(row.effect.value) : null,
        }
      : { a: row.a, b: row.b, diff: null, lower: null, upper: null, pAdj: null, effect: null },
  );
  return {
    rows: view,
    centreLabel: rank ? "shift" : "difference",
    effectLabel: rank ? "r" : "g",
    effectNote: rank
      ? "r: the rank-biserial correlation of the two groups (−1 to 1)."
      : "g: Hedges' g, the difference over the two groups' pooled SD, corrected for small samples.",
    hasIntervals: view.some((v) => v.lower !== null && v.upper !== null),
  };
}
