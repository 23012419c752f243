import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import type { RandomGenerator } from "pure-rand/types/RandomGenerator";
import { StatsInputError } from "../errors.js";
import { welchAnova } from "../omnibus/welch-anova.js";
import { kruskalWallis } from "../omnibus/kruskal-wallis.js";

export interface SimulatedPowerEstimate {
  /** share of simulated studies with p < α */
  power: number;
  /** Monte-Carlo standard error √(power(1 − power)/runs) */
  standardError: number;
  runs: number;
  /** simulated studies where the test could not be computed (counted as not significant) */
  unavailableRuns: number;
}

export interface SimulatedPowerResult {
  seed: number;
  simulations: number;
  alpha: number;
  welch: SimulatedPowerEstimate;
  kruskalWallis: SimulatedPowerEstimate;
}

/**
 * Monte-Carlo power of Welch's ANOVA and the Kruskal–Wallis test for normal groups with
 * the given means, SDs and sizes, from a seeded generator (same seed, same answer).
 *
 * In words: draw each group from N(μᵢ, σᵢ²) (Box–Muller on xoroshiro128+ uniforms), run
 * both tests, and count p < α; the power estimate is that share, with standard error
 * √(p̂(1 − p̂)/R) over R simulated studies. Useful where no closed form exists (Welch with
 * unequal variances, rank tests).
 *
 * Reference: Welch (1951), Biometrika 38, 330–336; Kruskal & Wallis (1952), JASA 47,
 * 583–621; Box & Muller (1958), Annals of Mathematical Statistics 29, 610–611; the
 * generator is Blackman & Vigna's xoroshiro128+ (pure-rand).
 * Example: simulatedPower({ means: [0, 0, 0.8], sds: [1, 1, 1], n: 20, simulations: 2000 })
 * → Welch power ≈ 0.7 ± 0.01.
 * Cost: O(R·N log N); about 1.5 s for R = 2000 and N = 60 (measured; the omnibus functions
 * validate and centre every simulated sample).
 */
export function simulatedPower(input: {
  means: readonly number[];
  sds: readonly number[];
  n: number | readonly number[];
  alpha?: number;
  simulations?: number;
  seed?: number;
}): SimulatedPowerResult {
  const alpha = input.alpha ?? 0.05;
  const simulations = input.simulations ?? 2000;
  const seed = input.seed ?? 20_240_101;
  const k = input.means.length;
  if (k < 2) throw new StatsInputError(`Simulated power needs at least two groups; got ${k}`);
  if (input.sds.length !== k)
    throw new StatsInputError(
      `Simulated power needs one SD per group; got ${input.sds.length} SDs for ${k} means`,
    );
  const sizes = typeof input.n === "number" ? new Array<number>(k).fill(input.n) : [...input.n];
  if (sizes.length !== k)
    throw new StatsInputError(
      `Simulated power needs one group size per group; got ${sizes.length} for ${k} means`,
    );
  for (const [i, n] of sizes.entries()) {
    if (!Number.isInteger(n) || n < 2)
      throw new StatsInputError(
        `Simulated power needs at least two values in every group; group ${i + 1} has ${n}`,
      );
  }
  for (const [i, s] of input.sds.entries()) {
    if (!(s > 0) || !Number.isFinite(s))
      throw new StatsInputError(`Simulated power needs every SD above 0; group ${i + 1} has ${s}`);
  }
  for (const m of input.means)
    if (!Number.isFinite(m)) throw new StatsInputError(`Simulated power needs finite means; got ${m}`);
  if (!(alpha > 0 && alpha < 1))
    throw new StatsInputError(`Simulated power needs alpha between 0 and 1; got ${alpha}`);
  if (!Number.isInteger(simulations) || simulations < 1 || simulations > 1_000_000) {
    throw new StatsInputError(
      `Simulated power needs between 1 and 1 000 000 simulations; got ${simulations}`,
    );
  }
  if (!Number.isInteger(seed))
    throw new StatsInputError(`Simulated power needs a whole-number seed; got ${seed}`);

  const rng = xoroshiro128plus(seed);
  const counts = { welch: { hit: 0, na: 0 }, kw: { hit: 0, na: 0 } };
  for (let r = 0; r < simulations; r++) {
    const groups = sizes.map((n, i) => ({
      name: `g${i + 1}`,
      values: Array.from(
        { length: n },
        () => (input.means[i] as number) + (input.sds[i] as number) * normal(rng),
      ),
    }));
    const w = welchAnova(groups);
    if (!w.available) counts.welch.na++;
    else if (w.p < alpha) counts.welch.hit++;
    const h = kruskalWallis(groups, { permutation: false });
    if (!h.available) counts.kw.na++;
    else if (h.p < alpha) counts.kw.hit++;
  }
  const estimate = ({ hit, na }: { hit: number; na: number }): SimulatedPowerEstimate => {
    const power = hit / simulations;
    return {
      power,
      standardError: Math.sqrt((power * (1 - power)) / simulations),
      runs: simulations,
      unavailableRuns: na,
    };
  };
  return { seed, simulations, alpha, welch: estimate(counts.welch), kruskalWallis: estimate(counts.kw) };
}

function normal(rng: RandomGenerator): number {
  // 1 − u lies in (0, 1], so the logarithm is finite.
  const u = 1 - uniformFloat64(rng);
  const v = uniformFloat64(rng);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}
