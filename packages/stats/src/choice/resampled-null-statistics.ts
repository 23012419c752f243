import type { RandomGenerator } from "pure-rand/types/RandomGenerator";
import { StatsInputError } from "../errors.js";
import { quantileSorted } from "../descriptives/quantile.js";
import { mixtureCentres } from "./smoothed-null-centres.js";

/**
 * The fixed part of the error-rate simulation, built once from the observed residuals: per
 * group its standardized residuals (sorted), SD, smoothing bandwidth and the shifts that put
 * the median and the trimmed mean of its resampling distribution at 0.
 */
export interface ResamplingFrame {
  readonly k: number;
  readonly N: number;
  readonly sizes: Int32Array;
  /** Group g's values live at [start[g], start[g+1]) of every replicate. */
  readonly start: Int32Array;
  /** Standardized residuals (x − x̄)/s of all groups, group after group. */
  readonly standardized: Float64Array;
  readonly sd: Float64Array;
  readonly bandwidth: Float64Array;
  /** −(median of group g's resampling distribution), in data units. */
  readonly medianShift: Float64Array;
  /** −(trimmed mean of group g's resampling distribution), in data units. */
  readonly trimShift: Float64Array;
  readonly trim: number;
}

/** Slots of the statistics vector a replicate fills (NaN where a test cannot be computed). */
export const STAT = {
  anovaF: 0,
  welchF: 1,
  welchDf2: 2,
  kruskalWallisH: 3,
  trimmedF: 4,
  trimmedDf2: 5,
} as const;
export const STAT_COUNT = 6;

/**
 * Silverman's rule-of-thumb bandwidth for standardized data (SD 1):
 * h = 0.9·min(1, IQR/1.34)·n^(−1/5) (Silverman 1986, Density Estimation, eq. 3.31).
 */
function bandwidthFor(sortedStandardized: Float64Array): number {
  const n = sortedStandardized.length;
  const iqr = quantileSorted(sortedStandardized, 0.75) - quantileSorted(sortedStandardized, 0.25);
  const spread = iqr > 0 ? Math.min(1, iqr / 1.34) : 1;
  return 0.9 * spread * n ** -0.2;
}

/** Groups above this size are resampled without kernel noise. */
export const SMOOTH_MAX_GROUP = 1000;

/**
 * Builds the frame from each group's residuals (values minus the group mean).
 * `smooth` = false draws the residuals themselves (the plain bootstrap); true adds normal
 * kernel noise, shrunk to keep the variance (Silverman & Young 1987), to groups of up to
 * SMOOTH_MAX_GROUP values.
 * Cost: O(N log N) plus O(N) root-finding per group for the centres.
 */
export function resamplingFrame(
  residuals: readonly ArrayLike<number>[],
  trim: number,
  smooth = true,
): ResamplingFrame {
  const k = residuals.length;
  if (k < 2) throw new StatsInputError(`The error-rate check needs at least two groups; found ${k}`);
  const sizes = new Int32Array(k);
  const start = new Int32Array(k + 1);
  let N = 0;
  residuals.forEach((r, g) => {
    sizes[g] = r.length;
    start[g] = N;
    N += r.length;
  });
  start[k] = N;
  const standardized = new Float64Array(N);
  const sd = new Float64Array(k);
  const bandwidth = new Float64Array(k);
  const medianShift = new Float64Array(k);
  const trimShift = new Float64Array(k);
  residuals.forEach((r, g) => {
    const n = r.length;
    let ss = 0;
    for (let i = 0; i < n; i++) ss += (r[i] as number) ** 2;
    const s = Math.sqrt(ss / (n - 1));
    sd[g] = s;
    const e = standardized.subarray(start[g] as number, start[g + 1] as number);
    if (s > 0) for (let i = 0; i < n; i++) e[i] = (r[i] as number) / s;
    e.sort();
    // Large groups are resampled plainly: their resamples are not lumpy, and the exact
    // mixture centres would cost O(n) per root-finding step.
    const h = smooth && s > 0 && n <= SMOOTH_MAX_GROUP ? bandwidthFor(e) : 0;
    bandwidth[g] = h;
    const c = mixtureCentres(e, h, trim);
    const scale = s / Math.sqrt(1 + h * h);
    medianShift[g] = -c.median * scale;
    trimShift[g] = -c.trimmedMean * scale;
  });
  return { k, N, sizes, start, standardized, sd, bandwidth, medianShift, trimShift, trim };
}

const TWO_POW_32 = 4294967296;

/**
 * Draws one null data set into `values` (group after group, each group's block sorted
 * ascending): y = s·(e* + h·z)/√(1 + h²), e* a standardized residual of the same group drawn
 * with replacement, z standard normal, so every group keeps its SD and shape and has mean 0.
 * Speed: each draw uses the generator's 32-bit outputs directly — the index as
 * ⌊u32·n/2³²⌋ (bias below n/2³², under 1e-6 for n ≤ 4000) and both Box–Muller normals of a
 * pair (Box & Muller 1958) from two 32-bit uniforms, which bounds |z| at 6.7 — harmless for
 * smoothing noise. Cost: O(N log n).
 */
export function drawReplicate(frame: ResamplingFrame, rng: RandomGenerator, values: Float64Array): void {
  const { k, sizes, start, standardized, sd, bandwidth } = frame;
  let spare = 0;
  let haveSpare = false;
  for (let g = 0; g < k; g++) {
    const n = sizes[g] as number;
    const a0 = start[g] as number;
    const h = bandwidth[g] as number;
    const scale = (sd[g] as number) / Math.sqrt(1 + h * h);
    for (let i = 0; i < n; i++) {
      const index = Math.floor(((rng.next() >>> 0) * n) / TWO_POW_32);
      let e = standardized[a0 + index] as number;
      if (h > 0) {
        let z: number;
        if (haveSpare) {
          z = spare;
          haveSpare = false;
        } else {
          // u in (0, 1], so the logarithm is finite.
          const u = ((rng.next() >>> 0) + 1) / TWO_POW_32;
          const angle = (2 * Math.PI * (rng.next() >>> 0)) / TWO_POW_32;
          const radius = Math.sqrt(-2 * Math.log(u));
          z = radius * Math.cos(angle);
          spare = radius * Math.sin(angle);
          haveSpare = true;
        }
        e += h * z;
      }
      values[a0 + i] = scale * e;
    }
    values.subarray(a0, a0 + n).sort();
  }
}

/** Scratch arrays for replicateStatistics, allocated once per simulation. */
export interface ReplicateScratch {
  mean: Float64Array;
  variance: Float64Array;
  trimmedMean: Float64Array;
  winsorizedVariance: Float64Array;
  h: Float64Array;
  rankSum: Float64Array;
  pointer: Int32Array;
  tied: Int32Array;
}

export function replicateScratch(k: number): ReplicateScratch {
  return {
    mean: new Float64Array(k),
    variance: new Float64Array(k),
    trimmedMean: new Float64Array(k),
    winsorizedVariance: new Float64Array(k),
    h: new Float64Array(k),
    rankSum: new Float64Array(k),
    pointer: new Int32Array(k),
    tied: new Int32Array(k),
  };
}

/**
 * The four omnibus statistics of one simulated data set (`values` as drawReplicate leaves
 * them: group blocks, each ascending), each on data centred for its own null:
 * classic one-way ANOVA F (Fisher) and Welch's F and df₂ (Welch 1951) on the values (equal
 * means); Kruskal–Wallis H with midranks and the tie correction (Kruskal & Wallis 1952) on
 * the values shifted by `medianShift` (equal medians); the heteroscedastic trimmed-means F and
 * df₂ (Yuen 1974; the k-group Welch form) with each trimmed mean shifted by `trimShift`
 * (equal trimmed means). The same formulas as oneWayAnova, welchAnova, kruskalWallis and
 * trimmedMeansAnova, without allocation or validation (tested equal to 1e-10).
 * Writes NaN into a slot when its test is undefined for the replicate (no within-group
 * spread, a constant group for Welch, a zero winsorized variance, all values tied).
 * Cost: O(N·k).
 */
export function replicateStatistics(
  frame: ResamplingFrame,
  values: Float64Array,
  s: ReplicateScratch,
  out: Float64Array,
): void {
  const { k, N, sizes, start, trim, medianShift, trimShift } = frame;
  let ssWithin = 0;
  let weighted = 0;
  let anyConstant = false;
  let anyWinsorizedZero = false;
  for (let g = 0; g < k; g++) {
    const n = sizes[g] as number;
    const a0 = start[g] as number;
    const a1 = start[g + 1] as number;
    let sum = 0;
    for (let a = a0; a < a1; a++) sum += values[a] as number;
    const constant = values[a0] === values[a1 - 1];
    const mean = constant ? (values[a0] as number) : sum / n;
    let ss = 0;
    if (!constant) {
      for (let a = a0; a < a1; a++) {
        const d = (values[a] as number) - mean;
        ss += d * d;
      }
    } else anyConstant = true;
    s.mean[g] = mean;
    s.variance[g] = ss / (n - 1);
    ssWithin += ss;
    weighted += n * mean;

    const cut = Math.floor(trim * n);
    const h = n - 2 * cut;
    s.h[g] = h;
    const wlo = values[a0 + cut] as number;
    const whi = values[a1 - 1 - cut] as number;
    if (wlo === whi) {
      s.trimmedMean[g] = wlo + (trimShift[g] as number);
      s.winsorizedVariance[g] = 0;
      anyWinsorizedZero = true;
    } else {
      let tsum = 0;
      for (let a = a0 + cut; a < a1 - cut; a++) tsum += values[a] as number;
      s.trimmedMean[g] = tsum / h + (trimShift[g] as number);
      const wMean = (tsum + cut * wlo + cut * whi) / n;
      let wss = cut * (wlo - wMean) ** 2 + cut * (whi - wMean) ** 2;
      for (let a = a0 + cut; a < a1 - cut; a++) {
        const d = (values[a] as number) - wMean;
        wss += d * d;
      }
      s.winsorizedVariance[g] = wss / (n - 1);
    }
  }

  // Classic ANOVA.
  const grand = weighted / N;
  let ssBetween = 0;
  for (let g = 0; g < k; g++) {
    const d = (s.mean[g] as number) - grand;
    ssBetween += (sizes[g] as number) * d * d;
  }
  out[STAT.anovaF] = ssWithin > 0 && N > k ? ssBetween / (k - 1) / (ssWithin / (N - k)) : NaN;

  if (anyConstant) {
    out[STAT.welchF] = NaN;
    out[STAT.welchDf2] = NaN;
  } else welchCombine(k, sizes, sizes, s.mean, s.variance, out, STAT.welchF, false);

  if (anyWinsorizedZero) {
    out[STAT.trimmedF] = NaN;
    out[STAT.trimmedDf2] = NaN;
  } else welchCombine(k, sizes, s.h, s.trimmedMean, s.winsorizedVariance, out, STAT.trimmedF, true);

  // Kruskal–Wallis: merge the sorted, median-shifted groups; equal values form a tie block.
  for (let g = 0; g < k; g++) {
    s.pointer[g] = start[g] as number;
    s.rankSum[g] = 0;
  }
  let pos = 0;
  let tieSum = 0;
  while (pos < N) {
    let m = Infinity;
    for (let g = 0; g < k; g++) {
      const p = s.pointer[g] as number;
      if (p < (start[g + 1] as number)) {
        const v = (values[p] as number) + (medianShift[g] as number);
        if (v < m) m = v;
      }
    }
    let t = 0;
    for (let g = 0; g < k; g++) {
      let p = s.pointer[g] as number;
      const end = start[g + 1] as number;
      const shift = medianShift[g] as number;
      let c = 0;
      while (p < end && (values[p] as number) + shift === m) {
        p++;
        c++;
      }
      s.pointer[g] = p;
      s.tied[g] = c;
      t += c;
    }
    const midrank = pos + (t + 1) / 2;
    for (let g = 0; g < k; g++) {
      const c = s.tied[g] as number;
      if (c > 0) s.rankSum[g] = (s.rankSum[g] as number) + c * midrank;
    }
    tieSum += t * t * t - t;
    pos += t;
  }
  const C = 1 - tieSum / (N * N * N - N);
  if (C > 0) {
    const centre = (N + 1) / 2;
    let sh = 0;
    for (let g = 0; g < k; g++) {
      const n = sizes[g] as number;
      const d = (s.rankSum[g] as number) / n - centre;
      sh += n * d * d;
    }
    out[STAT.kruskalWallisH] = ((12 / (N * (N + 1))) * sh) / C;
  } else out[STAT.kruskalWallisH] = NaN;
}

/**
 * Welch's combination (Welch 1951) with weights wⱼ = hⱼ(hⱼ − 1)/((nⱼ − 1)vⱼ) when `trimmed`,
 * else nⱼ/vⱼ (there hⱼ = nⱼ); writes F and df₂ into out[slot], out[slot + 1].
 */
function welchCombine(
  k: number,
  n: ArrayLike<number>,
  h: ArrayLike<number>,
  centre: ArrayLike<number>,
  variance: ArrayLike<number>,
  out: Float64Array,
  slot: number,
  trimmed: boolean,
): void {
  let U = 0;
  let mid = 0;
  for (let j = 0; j < k; j++) {
    const hj = h[j] as number;
    const w = trimmed
      ? (hj * (hj - 1)) / (((n[j] as number) - 1) * (variance[j] as number))
      : hj / (variance[j] as number);
    U += w;
    mid += w * (centre[j] as number);
  }
  mid /= U;
  let between = 0;
  let lambda = 0;
  for (let j = 0; j < k; j++) {
    const hj = h[j] as number;
    const w = trimmed
      ? (hj * (hj - 1)) / (((n[j] as number) - 1) * (variance[j] as number))
      : hj / (variance[j] as number);
    const d = (centre[j] as number) - mid;
    between += w * d * d;
    const r = 1 - w / U;
    lambda += (r * r) / (hj - 1);
  }
  out[slot] = between / (k - 1) / (1 + (2 * (k - 2) * lambda) / (k * k - 1));
  out[slot + 1] = (k * k - 1) / (3 * lambda);
}
