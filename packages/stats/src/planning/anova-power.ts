import { StatsInputError } from "../errors.js";
import { fQuantile } from "../distributions/f.js";
import { noncentralFSf } from "../distributions/noncentral-f.js";

export interface AnovaPowerInput {
  /** number of groups (may be left out when nPerGroup is an array) */
  k?: number;
  /** size of every group, or one size per group for unequal allocation */
  nPerGroup: number | readonly number[];
  /** Cohen's f = σ_m/σ, with σ_m the SD of the group means weighted by group size */
  f: number;
  alpha?: number;
}

export interface AnovaPowerResult {
  power: number;
  k: number;
  totalN: number;
  lambda: number;
  df1: number;
  df2: number;
  criticalF: number;
}

/**
 * Power of the one-way ANOVA F test for a given effect size f.
 *
 * In words: with N subjects over k groups, the F statistic follows a noncentral F with
 * df1 = k − 1, df2 = N − k and noncentrality λ = N·f² (for unequal sizes f is the
 * size-weighted SD of the means over σ, so λ = Σ nᵢ(μᵢ − μ̄)²/σ² still equals N·f²);
 * power = P(F′(df1, df2, λ) > F_{1−α}(df1, df2)).
 *
 * Reference: Cohen (1988), Statistical Power Analysis for the Behavioral Sciences, 2nd ed.,
 * ch. 8; noncentral F by Lenth (1987), AS 226.
 * Example: anovaPower({ k: 4, nPerGroup: 45, f: 0.25 }) → power ≈ 0.804 (N = 180, λ = 11.25).
 * Cost: one F quantile and one noncentral F tail, O(√λ).
 */
export function anovaPower(input: AnovaPowerInput): AnovaPowerResult {
  const alpha = input.alpha ?? 0.05;
  const sizes = groupSizes(input);
  const k = sizes.length;
  if (!(input.f >= 0) || !Number.isFinite(input.f)) {
    throw new StatsInputError(`Power analysis needs an effect size f of 0 or more; got ${input.f}`);
  }
  if (!(alpha > 0 && alpha < 1))
    throw new StatsInputError(`Power analysis needs alpha between 0 and 1; got ${alpha}`);
  const totalN = sizes.reduce((s, n) => s + n, 0);
  const df1 = k - 1;
  const df2 = totalN - k;
  const lambda = totalN * input.f * input.f;
  const criticalF = fQuantile(1 - alpha, df1, df2);
  const power = noncentralFSf(criticalF, df1, df2, lambda);
  return { power, k, totalN, lambda, df1, df2, criticalF };
}

function groupSizes(input: AnovaPowerInput): number[] {
  let sizes: number[];
  if (typeof input.nPerGroup === "number") {
    const k = input.k;
    if (k === undefined || !Number.isInteger(k) || k < 2) {
      throw new StatsInputError(
        `Power analysis needs k, the number of groups, to be a whole number of at least 2; got ${k}`,
      );
    }
    sizes = new Array<number>(k).fill(input.nPerGroup);
  } else {
    sizes = [...input.nPerGroup];
    if (sizes.length < 2)
      throw new StatsInputError(`Power analysis needs at least two groups; got ${sizes.length}`);
    if (input.k !== undefined && input.k !== sizes.length) {
      throw new StatsInputError(`Power analysis got k = ${input.k} but ${sizes.length} group sizes`);
    }
  }
  for (const [i, n] of sizes.entries()) {
    if (!Number.isInteger(n) || n < 2) {
      throw new StatsInputError(
        `Power analysis needs at least two subjects in every group; group ${i + 1} has ${n}`,
      );
    }
  }
  return sizes;
}
