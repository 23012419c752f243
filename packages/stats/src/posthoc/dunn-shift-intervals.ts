import type { Unavailable } from "../types/group-summary.js";
import { hodgesLehmannEstimate, hodgesLehmannShift } from "./hodges-lehmann-shift.js";

/**
 * Adds to each of Dunn's pairs the Hodges–Lehmann shift of a over b with its
 * distribution-free interval, at the Bonferroni level 1 − α/m for the m pairs in the family
 * (all k(k − 1)/2 pairs, or the k − 1 pairs with the control), so the m intervals cover
 * together with probability at least 1 − α whatever the dependence between them.
 * Bonferroni rather than the p-value adjustment of the family (Holm by default), because a
 * step-down procedure has no matching intervals. Fields added: shift, and lower, upper,
 * intervalLevel, achievedLevel, intervalMethod ("exact" or "normal"), intervalAdjustment
 * ("bonferroni"); or intervalReason when the groups are too small for that level.
 * Reference: Hodges & Lehmann (1963), Annals of Mathematical Statistics 34, 598–611;
 * Dunn (1961), JASA 56, 52–64 (Bonferroni).
 * Example: 3 groups, α = .05 → each interval at 1 − .05/3 ≈ 98.33%.
 * Cost: see hodgesLehmannShift, per pair.
 */
/** What withShiftIntervals adds to each pair. */
export interface ShiftIntervalFields {
  shift?: number;
  lower?: number;
  upper?: number;
  intervalLevel?: number;
  achievedLevel?: number;
  intervalMethod?: string;
  intervalAdjustment?: "bonferroni";
  intervalReason?: string;
}

export function withShiftIntervals<P extends { a: string; b: string }>(
  pairs: P[] | Unavailable,
  sortedByName: ReadonlyMap<string, Float64Array>,
  alpha: number,
  /** shift estimates by "a\u0000b", shared between the all-pairs and the against-control families */
  estimates: Map<string, number> = new Map(),
): (P & ShiftIntervalFields)[] | Unavailable {
  if (!Array.isArray(pairs) || pairs.length === 0) return pairs;
  const level = 1 - alpha / pairs.length;
  return pairs.map((p): P & ShiftIntervalFields => {
    const a = sortedByName.get(p.a);
    const b = sortedByName.get(p.b);
    if (!a || !b || a.length === 0 || b.length === 0) return p;
    const key = `${p.a}\u0000${p.b}`;
    const estimate = estimates.get(key) ?? hodgesLehmannEstimate(a, b);
    estimates.set(key, estimate);
    const hl = hodgesLehmannShift(a, b, level, { estimate });
    if (!hl.intervalAvailable)
      return {
        ...p,
        shift: hl.estimate,
        intervalReason: hl.intervalReason,
        intervalAdjustment: "bonferroni" as const,
      };
    return {
      ...p,
      shift: hl.estimate,
      lower: hl.lower,
      upper: hl.upper,
      intervalLevel: hl.intervalLevel,
      achievedLevel: hl.achievedLevel,
      intervalMethod: hl.intervalMethod,
      intervalAdjustment: "bonferroni" as const,
    };
  });
}
