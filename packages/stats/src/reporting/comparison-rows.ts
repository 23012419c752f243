import type { PosthocPart } from "../types/analysis-result.js";
import type { Unavailable } from "../types/group-summary.js";
import type { PosthocFamily } from "../vocabulary/ids.js";

/**
 * One post-hoc comparison in the form every screen and report table reads, whatever family it
 * came from: the pair, its difference and simultaneous interval (mean-based families), its z
 * and unadjusted p (Dunn), the adjusted p and the pair's effect size.
 */
export type ComparisonRow =
  | {
      available: true;
      a: string;
      b: string;
      /** mean_a − mean_b (mean-based families). */
      diff?: number;
      /** Simultaneous limits for mean_a − mean_b (Tukey–Kramer, Games–Howell, Dunnett). */
      lower?: number;
      upper?: number;
      /** Hodges–Lehmann shift estimate of b subtracted from a (rank families), with lower/upper its interval. */
      shift?: number;
      /** Why a pair has no interval (e.g. too few values for the adjusted level). */
      intervalReason?: string;
      /** Dunn's z and unadjusted two-sided p; Welch t's unadjusted p. */
      z?: number;
      p?: number;
      pAdj: number;
      effect: { available: true; kind: "hedges-g" | "rank-biserial"; value: number } | Unavailable;
    }
  | { available: false; a: string; b: string; reason: string };

/** Where each family's pairs sit in analyze()'s posthoc part. */
function familyPairs(posthoc: PosthocPart, family: PosthocFamily) {
  const missingControl: Unavailable = {
    available: false,
    reason: "no control group was named, so comparisons with a control were not computed",
  };
  switch (family) {
    case "tukey-kramer":
      return posthoc.tukey;
    case "games-howell":
      return posthoc.gamesHowell;
    case "dunn":
      return posthoc.dunn;
    case "dunnett":
      return posthoc.control?.dunnett ?? missingControl;
    case "welch-vs-control-holm":
      return posthoc.control?.welchHolm ?? missingControl;
    case "dunn-vs-control":
      return posthoc.control?.dunn ?? missingControl;
  }
}

/**
 * The rows of one post-hoc family, or why it could not run.
 * Example: comparisonRows(analyze(...).posthoc, "tukey-kramer")[0] → { a, b, diff, lower, upper, pAdj, effect }.
 * Cost: O(number of pairs).
 */
export function comparisonRows(posthoc: PosthocPart, family: PosthocFamily): ComparisonRow[] | Unavailable {
  const pairs = familyPairs(posthoc, family);
  if (!Array.isArray(pairs)) return pairs;
  return pairs.map((x): ComparisonRow => {
    if ("available" in x && x.available === false)
      return { available: false, a: x.a, b: x.b, reason: x.reason };
    if ("rankBiserial" in x) {
      const rb = x.rankBiserial;
      const shift = x as { shift?: number; lower?: number; upper?: number; intervalReason?: string };
      return {
        available: true,
        a: x.a,
        b: x.b,
        ...(shift.shift !== undefined ? { shift: shift.shift } : {}),
        ...(shift.lower !== undefined && shift.upper !== undefined
          ? { lower: shift.lower, upper: shift.upper }
          : {}),
        ...(shift.intervalReason !== undefined ? { intervalReason: shift.intervalReason } : {}),
        z: x.z,
        p: x.p,
        pAdj: x.pAdj,
        effect: rb.available ? { available: true, kind: "rank-biserial", value: rb.r } : rb,
      };
    }
    const g = x.hedgesG;
    const extra = x as { lower?: number; upper?: number; intervalReason?: string };
    return {
      available: true,
      a: x.a,
      b: x.b,
      diff: x.diff,
      ...(extra.lower !== undefined && extra.upper !== undefined
        ? { lower: extra.lower, upper: extra.upper }
        : {}),
      ...(extra.intervalReason !== undefined ? { intervalReason: extra.intervalReason } : {}),
      ...("p" in x ? { p: x.p } : {}),
      pAdj: x.pAdj,
      effect: g.available ? { available: true, kind: "hedges-g", value: g.g } : g,
    };
  });
}
