import { StatsInputError } from "../errors.js";
import { anovaPower } from "./anova-power.js";

export interface AnovaSampleSizeResult {
  nPerGroup: number;
  totalN: number;
  achievedPower: number;
}

/**
 * Smallest equal group size at which the one-way ANOVA reaches a target power.
 *
 * In words: power rises with n (λ = k·n·f² grows and the critical F falls), so the answer
 * is found by doubling n until the target is met and then bisecting on whole numbers; the
 * power actually achieved at that n is returned with it.
 *
 * Reference: Cohen (1988), Statistical Power Analysis for the Behavioral Sciences, 2nd ed.,
 * ch. 8 (Table 8.4.4 tabulates the same quantity).
 * Example: anovaSampleSize({ k: 4, f: 0.25, power: 0.8 }) → 45 per group (power ≈ 0.804).
 * Cost: O(log n) power evaluations.
 */
export function anovaSampleSize(input: {
  k: number;
  f: number;
  alpha?: number;
  power?: number;
}): AnovaSampleSizeResult {
  const target = input.power ?? 0.8;
  const alpha = input.alpha ?? 0.05;
  if (!(target > 0 && target < 1))
    throw new StatsInputError(`Sample-size planning needs a target power between 0 and 1; got ${target}`);
  if (!(input.f > 0) || !Number.isFinite(input.f)) {
    throw new StatsInputError(`Sample-size planning needs an effect size f above 0; got ${input.f}`);
  }
  if (target <= alpha) {
    throw new StatsInputError(
      `Sample-size planning needs a target power above alpha (${alpha}); got ${target}`,
    );
  }
  const powerAt = (n: number) => anovaPower({ k: input.k, nPerGroup: n, f: input.f, alpha }).power;
  let lo = 2;
  if (powerAt(lo) >= target) return result(lo);
  let hi = 4;
  while (powerAt(hi) < target) {
    lo = hi;
    hi *= 2;
    if (hi > 1e8)
      throw new StatsInputError(
        `Sample-size planning: f = ${input.f} is too small to reach power ${target} with fewer than 10⁸ per group`,
      );
  }
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (powerAt(mid) >= target) hi = mid;
    else lo = mid;
  }
  return result(hi);

  function result(n: number): AnovaSampleSizeResult {
    return { nPerGroup: n, totalN: n * input.k, achievedPower: powerAt(n) };
  }
}
