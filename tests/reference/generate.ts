import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import type { RandomGenerator } from "pure-rand/types/RandomGenerator";
import type { GroupSummary, GroupValues } from "../../packages/stats/src/types/group-summary.js";

/**
 * Seeded, invented test data for the reference suites. Nothing here is copied from a
 * book or course: every data set is drawn from a named seed, so a failing check can be
 * reproduced exactly and the python runners receive the very same numbers.
 */

export type Shape = "normal" | "skewed" | "ties";

export interface GroupSpec {
  n: number[];
  mean: number[];
  sd: number[];
  shape?: Shape;
}

/** A standard normal draw by Box–Muller (one of the pair is enough for test data). */
export function standardNormal(rng: RandomGenerator): number {
  // 1 − u keeps the logarithm's argument in (0, 1].
  const u = 1 - uniformFloat64(rng);
  const v = uniformFloat64(rng);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}

/** A seeded generator; the same seed always gives the same stream. */
export function makeRng(seed: number): RandomGenerator {
  return xoroshiro128plus(seed);
}

// Log-normal with σ = 0.8, standardised to mean 0 and SD 1, so "skewed" groups keep the
// requested mean and SD but have a long right tail.
const LN_SIGMA = 0.8;
const LN_MEAN = Math.exp((LN_SIGMA * LN_SIGMA) / 2);
const LN_SD = Math.sqrt((Math.exp(LN_SIGMA * LN_SIGMA) - 1) * Math.exp(LN_SIGMA * LN_SIGMA));

function draw(rng: RandomGenerator, mean: number, sd: number, shape: Shape): number {
  const z = standardNormal(rng);
  switch (shape) {
    case "normal":
      return mean + sd * z;
    case "skewed":
      return mean + (sd * (Math.exp(LN_SIGMA * z) - LN_MEAN)) / LN_SD;
    case "ties":
      // Whole numbers only: with a small SD most values coincide.
      return Math.round(mean + sd * z);
  }
}

/** Groups named A, B, C, ... drawn from the spec with the given seed. */
export function makeGroups(seed: number, spec: GroupSpec): GroupValues[] {
  const rng = makeRng(seed);
  const shape = spec.shape ?? "normal";
  return spec.n.map((n, i) => {
    const mean = spec.mean[i] ?? 0;
    const sd = spec.sd[i] ?? 1;
    const values: number[] = [];
    for (let j = 0; j < n; j++) values.push(draw(rng, mean, sd, shape));
    return { name: String.fromCharCode(65 + i), values };
  });
}

/** Mean and n − 1 variance of each group (two-pass, for test use). */
export function summarize(groups: GroupValues[]): GroupSummary[] {
  return groups.map(({ name, values }) => {
    const n = values.length;
    const mean = values.reduce((s, x) => s + x, 0) / n;
    const variance = n > 1 ? values.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1) : 0;
    return { name, n, mean, variance };
  });
}

/** Pooled within-group mean square and its degrees of freedom. */
export function msWithin(groups: GroupSummary[]): { msWithin: number; dfWithin: number } {
  const ss = groups.reduce((s, g) => s + (g.n - 1) * g.variance, 0);
  const df = groups.reduce((s, g) => s + g.n, 0) - groups.length;
  return { msWithin: ss / df, dfWithin: df };
}

/** The named scenarios the reference suites iterate over. */
export const SCENARIOS: Record<string, { seed: number; spec: GroupSpec }> = {
  balanced: { seed: 101, spec: { n: [12, 12, 12, 12], mean: [10, 11, 10.5, 13], sd: [2, 2, 2, 2] } },
  unequalN: { seed: 202, spec: { n: [5, 17, 9, 30], mean: [4, 5, 4.2, 6], sd: [1.5, 1.5, 1.5, 1.5] } },
  unequalVar: { seed: 303, spec: { n: [8, 20, 14], mean: [50, 53, 49], sd: [1, 6, 12] } },
  skewed: {
    seed: 404,
    spec: { n: [15, 22, 18, 11], mean: [3, 3.5, 4.5, 3], sd: [1, 1.4, 2, 0.8], shape: "skewed" },
  },
  ties: {
    seed: 505,
    spec: { n: [14, 16, 13, 15], mean: [3, 3.4, 4, 3.2], sd: [0.9, 0.9, 0.9, 0.9], shape: "ties" },
  },
  tiny: { seed: 606, spec: { n: [2, 3, 2], mean: [0, 1, 2], sd: [1, 1, 1] } },
  many: {
    seed: 707,
    spec: {
      n: [9, 11, 10, 12, 8, 10, 13, 9, 10, 11],
      mean: [0, 0.3, 0.1, 1, -0.2, 0.5, 0.8, 0, 1.5, 0.2],
      sd: [1, 1.1, 0.9, 1, 1.2, 1, 0.8, 1, 1.1, 1],
    },
  },
};
