import { chiSquareSf } from "../distributions/chi-square.js";
import { log10ChiSquareSf } from "../distributions/log10-tails.js";
import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { midranks } from "../numeric/midranks.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { requireGroupSizes } from "../numeric/require-group-sizes.js";
import { permutationKruskalWallis, type PermutationResult } from "./permutation-kruskal-wallis.js";

/** Total size at or below which the chi-square approximation is backed by a permutation p. Common practice. */
export const KW_PERMUTATION_MAX_TOTAL = 30;
/** Smallest group size below which the permutation p is added whatever the total. Common practice (Kruskal & Wallis 1952 tabulated small samples up to n = 5). */
export const KW_PERMUTATION_MIN_GROUP = 5;
/** Permutation p-values are skipped above this total, where the chi-square approximation serves and the cost grows. */
export const KW_PERMUTATION_COST_LIMIT = 5000;
/** Default number of random permutations and seed (fixed, so results are reproducible). */
export const KW_PERMUTATION_DRAWS = 10_000;
export const KW_PERMUTATION_SEED = 20_240_617;

export interface KruskalWallisResult {
  available: true;
  method: "Kruskal–Wallis";
  H: number;
  df: number;
  /** Upper tail of χ²(k − 1) at H. */
  p: number;
  /** log₁₀ p, finite where p underflows to 0 (e.g. −716.3 for p ≈ 5e−717). */
  log10p: number;
  /** ε² = H/(N − 1) (Tomczak & Tomczak 2014). */
  epsilonSquared: number;
  /** C = 1 − Σ(t³ − t)/(N³ − N); H has been divided by it. */
  tieCorrection: number;
  meanRanks: { group: string; n: number; meanRank: number }[];
  /** Seeded Monte-Carlo permutation p-value, present for small samples. */
  permutation?: PermutationResult;
}

export interface KruskalWallisOptions {
  /** Force (true) or suppress (false) the permutation p-value; by default it follows the thresholds above. */
  permutation?: boolean;
  draws?: number;
  seed?: number;
}

/**
 * Kruskal–Wallis rank test: with midranks of the pooled sample and group mean ranks R̄ᵢ,
 * H = [12/(N(N+1)) Σ nᵢ(R̄ᵢ − (N+1)/2)²] / C, where C = 1 − Σ(t³ − t)/(N³ − N) corrects for
 * ties; p from χ² with k − 1 df. The squared-deviation form avoids the cancellation of the
 * textbook ΣRᵢ²/nᵢ − 3(N+1) form. Effect size ε² = H/(N − 1).
 * For small samples (N ≤ 30 or any group below 5 values, and N ≤ 5000) a seeded Monte-Carlo
 * permutation p-value (b + 1)/(B + 1) is added.
 * References: Kruskal, W. H. & Wallis, W. A. (1952). JASA 47, 583–621; Tomczak, M. &
 * Tomczak, E. (2014). Trends in Sport Sciences 21, 19–25 (ε²).
 * Example: kruskalWallis([{name:"A",values:[1,2,3]},{name:"B",values:[4,5,6]}]) → H = 3.857…, p = 0.0495…
 * Cost: O(N log k) after the per-group sorts; the permutation adds O(B·N).
 * Unavailable when all values are tied (C = 0).
 */
export function kruskalWallis(
  input: SampleInput,
  options: KruskalWallisOptions = {},
): KruskalWallisResult | Unavailable {
  const sample = prepareSample(input);
  requireGroupSizes(sample, "The Kruskal–Wallis test", 1);
  const sizes = sample.groups.map((g) => g.centred.length);
  const k = sample.groups.length;
  const Ntotal = sizes.reduce((a, b) => a + b, 0);
  const small = Ntotal <= KW_PERMUTATION_MAX_TOTAL || Math.min(...sizes) < KW_PERMUTATION_MIN_GROUP;
  const wanted = options.permutation ?? (small && Ntotal <= KW_PERMUTATION_COST_LIMIT);
  const { rankSums, tieSum, ranks, N } = midranks(sample, wanted);
  const Nf = N;
  const tieCorrection = 1 - tieSum / (Nf * Nf * Nf - Nf);
  if (!(tieCorrection > 0)) {
    return {
      available: false,
      reason: "All values are tied, so the ranks carry no information and H is undefined",
    };
  }
  const H = statistic(rankSums, sizes, N, tieCorrection);
  const df = k - 1;
  const result: KruskalWallisResult = {
    available: true,
    method: "Kruskal–Wallis",
    H,
    df,
    p: chiSquareSf(H, df),
    log10p: log10ChiSquareSf(H, df),
    epsilonSquared: H / (N - 1),
    tieCorrection,
    meanRanks: sample.groups.map((g, i) => ({
      group: g.name,
      n: sizes[i] as number,
      meanRank: (rankSums[i] as number) / (sizes[i] as number),
    })),
  };
  if (wanted && ranks) {
    result.permutation = permutationKruskalWallis(ranks, sizes, H, tieCorrection, {
      draws: options.draws ?? KW_PERMUTATION_DRAWS,
      seed: options.seed ?? KW_PERMUTATION_SEED,
    });
  }
  return result;
}

function statistic(
  rankSums: readonly number[],
  sizes: readonly number[],
  N: number,
  tieCorrection: number,
): number {
  const centre = (N + 1) / 2;
  let s = 0;
  rankSums.forEach((R, i) => {
    const n = sizes[i] as number;
    const d = R / n - centre;
    s += n * d * d;
  });
  return ((12 / (N * (N + 1))) * s) / tieCorrection;
}
