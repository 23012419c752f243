import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { StatsInputError } from "../errors.js";
import { chiSquareSf } from "../distributions/chi-square.js";
import { fSf } from "../distributions/f.js";
import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { requireGroupSizes } from "../numeric/require-group-sizes.js";
import { DEFAULT_TRIM } from "../omnibus/trimmed-means-anova.js";
import {
  drawReplicate,
  replicateScratch,
  replicateStatistics,
  resamplingFrame,
  STAT,
  STAT_COUNT,
} from "./resampled-null-statistics.js";

/** Simulated data sets for samples up to ERROR_RATE_FULL_N values in total. */
export const ERROR_RATE_RUNS = 2000;
export const ERROR_RATE_FULL_N = 2000;
/** Fewest runs above ERROR_RATE_FULL_N (Monte Carlo SE ≤ 0.016 at a rate of .05). */
export const ERROR_RATE_MIN_RUNS = 200;
export const ERROR_RATE_SEED = 20_261_202;
/** Above this many values the check is not run (200 runs would take several seconds). */
export const ERROR_RATE_MAX_N = 50_000;
/** What `runs` may be set to, so no input can ask for unbounded work. */
export const ERROR_RATE_MAX_RUNS = 20_000;

export interface TestErrorRate {
  available: true;
  /** Share of simulated null data sets where the test gave p < α. */
  rate: number;
  /** Monte Carlo standard error √(rate(1 − rate)/runsComputed). */
  standardError: number;
  /** Simulated data sets where the test could be computed (the rate's denominator). */
  runsComputed: number;
}

export interface ErrorRateCheckResult {
  available: true;
  method: "residual resampling under equal centres";
  /** Simulated data sets. */
  runs: number;
  /** How runs follow from the total size, in words. */
  runsRule: string;
  seed: number;
  alpha: number;
  trim: number;
  sizes: number[];
  rates: {
    anova: TestErrorRate | Unavailable;
    welch: TestErrorRate | Unavailable;
    kruskalWallis: TestErrorRate | Unavailable;
    trimmedMeans: TestErrorRate | Unavailable;
  };
  /** Plain sentences about what was reduced or left out. */
  notes: string[];
}

export interface ErrorRateCheckOptions {
  alpha?: number;
  seed?: number;
  /** Runs for samples up to 2,000 values (default 2,000); larger samples get proportionally fewer. */
  runs?: number;
  trim?: number;
  /** Add kernel noise to the resampled residuals (default true); false is the plain bootstrap. */
  smooth?: boolean;
}

/** The run count for a total size: full below ERROR_RATE_FULL_N, then in proportion, floored. */
export function errorRateRuns(N: number, base = ERROR_RATE_RUNS): number {
  if (N <= ERROR_RATE_FULL_N) return base;
  return Math.max(Math.min(ERROR_RATE_MIN_RUNS, base), Math.floor((base * ERROR_RATE_FULL_N) / N));
}

/** Below this group size the note about uncertain shapes is added. Common practice (a rough rule). */
export const ERROR_RATE_SMALL_GROUP = 10;

/**
 * Error-rate check for the data at hand: how often each candidate omnibus test would falsely
 * find a difference in data like these when the groups' centres are in truth equal.
 * In words: keep the observed group sizes; in every run, draw each group's values with
 * replacement from that group's own standardized residuals (x − x̄)/s, add a little normal
 * kernel noise (bandwidth by Silverman's rule, shrunk so the variance is kept — the smoothed
 * bootstrap, which stops tiny groups from producing constant or lumpy resamples), and rescale
 * by the group's SD; so every group keeps its spread and shape. Each test then sees data whose
 * own centre is equal across groups: the mean (0) for classic one-way ANOVA and Welch's
 * ANOVA, the trimmed mean for the trimmed-means test, the median for Kruskal–Wallis (chi-square
 * approximation, tie-corrected) — the centres of the smoothed distribution, computed exactly.
 * The rate is the share of runs with p < α among the runs where the test could be computed,
 * with Monte Carlo SE √(r(1 − r)/R).
 * Runs: `runs` (default 2,000) for N ≤ 2,000, else max(200, ⌊runs·2000/N⌋), stated in the
 * result. Seeded xoroshiro128+ (pure-rand 8.4.2): same data and seed, same result.
 * Limits, said in `notes`: the check copies the observed spreads and shapes, which are
 * uncertain in small groups (below 10 values a rate can be off by several points); and a
 * Kruskal–Wallis rate above α shows that with these spreads and sizes it reacts to
 * differences in spread or shape, not only in location (Fagerland & Sandvik 2009, Statistics
 * in Medicine 28, 1487–1497).
 * References: Efron, B. & Tibshirani, R. J. (1993). An Introduction to the Bootstrap, §16
 * (tests by resampling groups moved to a common centre); Silverman, B. W. & Young, G. A.
 * (1987). The bootstrap: to smooth or not to smooth? Biometrika 74, 469–479; Welch (1951);
 * Kruskal & Wallis (1952); Yuen (1974).
 * Example: errorRateCheck(groups) for groups of 16/50/30/80 with the largest SD in the
 *   smallest → { runs: 2000, rates: { anova: { rate: 0.4… }, welch: { rate: 0.09… }, … } }.
 * Cost: O(N log N) once, then per run O(N log n) to draw and sort, O(N·k) for the statistics
 * and four p-values; 2,000 runs at N = 2,000 (k = 4) took 1.1–1.7 s with the machine's load
 * average near 10 on 2 cores (measured 2026-12-02).
 * Unavailable above 50,000 values (the work would take several seconds). Throws
 * StatsInputError for fewer than two groups, a group with fewer than two values, or options
 * out of range.
 */
export function errorRateCheck(
  input: SampleInput,
  options: ErrorRateCheckOptions = {},
): ErrorRateCheckResult | Unavailable {
  const alpha = options.alpha ?? 0.05;
  const seed = options.seed ?? ERROR_RATE_SEED;
  const base = options.runs ?? ERROR_RATE_RUNS;
  const trim = options.trim ?? DEFAULT_TRIM;
  const smooth = options.smooth ?? true;
  if (!(alpha > 0 && alpha < 1))
    throw new StatsInputError(`The error-rate check needs alpha between 0 and 1; got ${alpha}`);
  if (!Number.isSafeInteger(seed))
    throw new StatsInputError(`The error-rate check needs a whole-number seed; got ${seed}`);
  if (!Number.isInteger(base) || base < 1 || base > ERROR_RATE_MAX_RUNS)
    throw new StatsInputError(
      `The error-rate check needs between 1 and ${ERROR_RATE_MAX_RUNS} runs; got ${base}`,
    );
  if (!(trim >= 0 && trim < 0.5))
    throw new StatsInputError(`The error-rate check needs a trim between 0 and 0.5; got ${trim}`);
  const sample = prepareSample(input);
  requireGroupSizes(sample, "The error-rate check", 2);
  const k = sample.groups.length;
  const total = sample.groups.reduce((a, g) => a + g.centred.length, 0);
  if (total > ERROR_RATE_MAX_N)
    return {
      available: false,
      reason: `The error-rate check simulates data sets as large as yours; with ${total} values (more than ${ERROR_RATE_MAX_N}) that would take too long, so it is not run`,
    };
  const residuals = sample.groups.map((g) => {
    const mean = groupMoments(g).mean;
    const r = new Float64Array(g.centred.length);
    for (let i = 0; i < r.length; i++) r[i] = (g.centred[i] as number) - mean;
    return r;
  });
  const frame = resamplingFrame(residuals, trim, smooth);
  const N = frame.N;
  const runs = errorRateRuns(N, base);
  const runsRule = `${base} runs for up to ${ERROR_RATE_FULL_N} values; above that max(${Math.min(ERROR_RATE_MIN_RUNS, base)}, ⌊${base}·${ERROR_RATE_FULL_N}/N⌋)`;
  const notes: string[] = [];
  if (runs < base)
    notes.push(
      `With ${N} values the check ran ${runs} simulated data sets instead of ${base} to bound the work, so each rate is less precise (see its standard error).`,
    );

  // Tests a group's data rule out whatever is resampled: say so instead of simulating.
  const constant = sample.groups.filter((g) => groupMoments(g).ss === 0).map((g) => `'${g.name}'`);
  const winsorizedZero = sample.groups
    .filter((g, i) => {
      const r = frame.standardized.subarray(frame.start[i] as number, frame.start[i + 1] as number);
      const cut = Math.floor(trim * r.length);
      return r[cut] === r[r.length - 1 - cut];
    })
    .map((g) => `'${g.name}'`);
  const listed = (names: string[]) =>
    `group${names.length > 1 ? "s" : ""} ${names.join(", ")} ${names.length > 1 ? "have" : "has"}`;
  const welchOut: Unavailable | undefined =
    constant.length > 0
      ? {
          available: false,
          reason: `Welch's ANOVA cannot be computed on data like these: ${listed(constant)} zero variance, and so does every resample of it`,
        }
      : undefined;
  const trimmedOut: Unavailable | undefined =
    winsorizedZero.length > 0
      ? {
          available: false,
          reason: `The trimmed-means test cannot be computed on data like these: ${listed(winsorizedZero)} zero winsorized variance, and so does every resample of it`,
        }
      : undefined;
  const smallest = Math.min(...Array.from(frame.sizes));
  if (smallest < ERROR_RATE_SMALL_GROUP)
    notes.push(
      `The smallest group has ${smallest} values, so the spreads and shapes the check copies are themselves uncertain; read the rates as approximate.`,
    );
  if (welchOut || trimmedOut) {
    const still = ["classic one-way ANOVA", "Kruskal–Wallis"];
    if (!welchOut) still.push("Welch's ANOVA");
    if (!trimmedOut) still.push("the trimmed-means test");
    notes.push(`The check covers ${still.join(", ")}.`);
  }

  const rng = xoroshiro128plus(seed);
  const values = new Float64Array(N);
  const scratch = replicateScratch(k);
  const out = new Float64Array(STAT_COUNT);
  const hit = new Int32Array(4);
  const done = new Int32Array(4);
  const df1 = k - 1;
  const dfW = N - k;
  // NaN marks a test that cannot be computed on this replicate (x === x is false only for NaN).
  const tally = (i: number, p: number) => {
    done[i] = (done[i] as number) + 1;
    if (p < alpha) hit[i] = (hit[i] as number) + 1;
  };
  for (let r = 0; r < runs; r++) {
    drawReplicate(frame, rng, values);
    replicateStatistics(frame, values, scratch, out);
    const F = out[STAT.anovaF] as number;
    if (F === F) tally(0, fSf(F, df1, dfW));
    const W = out[STAT.welchF] as number;
    if (W === W) tally(1, fSf(W, df1, out[STAT.welchDf2] as number));
    const H = out[STAT.kruskalWallisH] as number;
    if (H === H) tally(2, chiSquareSf(H, df1));
    const T = out[STAT.trimmedF] as number;
    if (T === T) tally(3, fSf(T, df1, out[STAT.trimmedDf2] as number));
  }
  const rate = (i: number, name: string): TestErrorRate | Unavailable => {
    const m = done[i] as number;
    if (m === 0)
      return {
        available: false,
        reason: `${name} could not be computed on any simulated data set (no spread to test)`,
      };
    const p = (hit[i] as number) / m;
    return { available: true, rate: p, standardError: Math.sqrt((p * (1 - p)) / m), runsComputed: m };
  };
  const rates = {
    anova: rate(0, "Classic one-way ANOVA"),
    welch: welchOut ?? rate(1, "Welch's ANOVA"),
    kruskalWallis: rate(2, "The Kruskal–Wallis test"),
    trimmedMeans: trimmedOut ?? rate(3, "The trimmed-means test"),
  };
  for (const [name, r] of [
    ["Welch's ANOVA", rates.welch],
    ["The trimmed-means test", rates.trimmedMeans],
    ["Classic one-way ANOVA", rates.anova],
  ] as const) {
    if (r.available && r.runsComputed < runs)
      notes.push(
        `${name} could not be computed on ${runs - r.runsComputed} of ${runs} simulated data sets (a resampled group without spread); its rate is over the other ${r.runsComputed}.`,
      );
  }
  return {
    available: true,
    method: "residual resampling under equal centres",
    runs,
    runsRule,
    seed,
    alpha,
    trim,
    sizes: Array.from(frame.sizes),
    rates,
    notes,
  };
}
