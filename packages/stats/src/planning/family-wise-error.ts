import { StatsInputError } from "../errors.js";

/** Which comparisons the plan makes: every pair, or each group against one control. */
export type PlannedComparisons = "all-pairs" | "vs-control";

/** The number of comparisons a plan makes among k groups: k − 1 against a control, k(k − 1)/2 for all pairs. */
export function plannedComparisonCount(k: number, comparisons: PlannedComparisons): number {
  return comparisons === "vs-control" ? k - 1 : (k * (k - 1)) / 2;
}

export interface FamilyWiseErrorResult {
  m: number;
  /** the comparisons m counts (as planned); absent when m was given directly */
  comparisons?: PlannedComparisons;
  alpha: number;
  /** 1 − (1 − α)^m: chance of at least one false positive over m independent tests */
  fwerIndependent: number;
  /** min(1, m·α): Boole's bound, valid under any dependence */
  bonferroniBound: number;
  /** α/m */
  perComparisonAlphaBonferroni: number;
  /** 1 − (1 − α)^{1/m} */
  sidakAlpha: number;
}

/**
 * Family-wise error rate of m unadjusted comparisons, and the per-comparison levels that
 * hold it at α.
 *
 * In words: m is the number of comparisons actually planned: with k groups, k − 1 when
 * each group is compared with a control and k(k − 1)/2 for all pairs (the default when
 * only k is given), or m given directly. For m independent tests at level α the chance of one or more false positives
 * is 1 − (1 − α)^m; Boole's inequality bounds it by m·α under any dependence. Testing each
 * at α/m (Bonferroni) or at 1 − (1 − α)^{1/m} (Šidák) keeps it at or below α.
 * Computed with log1p/expm1 so tiny α stays exact.
 *
 * Reference: Šidák (1967), JASA 62, 626–633; Dunn (1961), JASA 56, 52–64 (Bonferroni).
 * Example: familyWiseError({ k: 7, alpha: 0.05 }) → m = 21, FWER ≈ 0.6594;
 * familyWiseError({ k: 4, comparisons: "vs-control" }) → m = 3, FWER = 1 − 0.95³ = 0.142625.
 * Cost: O(1).
 */
export function familyWiseError(input: {
  k?: number;
  m?: number;
  alpha?: number;
  comparisons?: PlannedComparisons;
}): FamilyWiseErrorResult {
  const alpha = input.alpha ?? 0.05;
  if (!(alpha > 0 && alpha < 1))
    throw new StatsInputError(`The family-wise error rate needs alpha between 0 and 1; got ${alpha}`);
  let m: number;
  if (input.m !== undefined) {
    m = input.m;
    if (!Number.isInteger(m) || m < 1)
      throw new StatsInputError(
        `The family-wise error rate needs m, the number of comparisons, to be a whole number of at least 1; got ${m}`,
      );
    if (input.k !== undefined && plannedComparisonCount(input.k, input.comparisons ?? "all-pairs") !== m) {
      throw new StatsInputError(
        input.comparisons === "vs-control"
          ? `The family-wise error rate got k = ${input.k} and m = ${m}, which disagree (k groups give k − 1 comparisons with a control)`
          : `The family-wise error rate got k = ${input.k} and m = ${m}, which disagree (k groups give k(k − 1)/2 pairs)`,
      );
    }
  } else if (input.k !== undefined) {
    if (!Number.isInteger(input.k) || input.k < 2) {
      throw new StatsInputError(
        `The family-wise error rate needs k, the number of groups, to be a whole number of at least 2; got ${input.k}`,
      );
    }
    m = plannedComparisonCount(input.k, input.comparisons ?? "all-pairs");
  } else {
    throw new StatsInputError(
      "The family-wise error rate needs k (number of groups) or m (number of comparisons)",
    );
  }
  const log1mAlpha = Math.log1p(-alpha);
  return {
    m,
    ...(input.comparisons !== undefined || input.m === undefined
      ? { comparisons: input.comparisons ?? "all-pairs" }
      : {}),
    alpha,
    fwerIndependent: -Math.expm1(m * log1mAlpha),
    bonferroniBound: Math.min(1, m * alpha),
    perComparisonAlphaBonferroni: alpha / m,
    sidakAlpha: -Math.expm1(log1mAlpha / m),
  };
}
