import type { Unavailable } from "../types/group-summary.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { sortedValues } from "../numeric/sorted-values.js";
import { toOriginal } from "../numeric/to-original.js";
import { quantileSorted } from "../descriptives/quantile.js";
import { quartilesOriginal } from "../descriptives/quartiles-original.js";

/** Tukey's inner and outer fence multipliers (Tukey 1977, Exploratory Data Analysis). */
export const MILD_FENCE_IQR = 1.5;
export const EXTREME_FENCE_IQR = 3;
/** |internally studentized residual| above this is flagged. Common practice. */
export const STUDENTIZED_RESIDUAL_LIMIT = 3;
/** At most this many flagged values are listed per group and rule; counts are always complete. */
export const MAX_LISTED_OUTLIERS = 50;

export interface FlaggedValue {
  value: number;
  /** The value's row number as given with the input, else its 1-based position in the group. */
  row: number;
  studentizedResidual?: number;
}

export interface GroupOutliers {
  group: string;
  lowerFence: number;
  upperFence: number;
  lowerExtremeFence: number;
  upperExtremeFence: number;
  /** Beyond 1.5 IQR but within 3 IQR. */
  mild: FlaggedValue[];
  mildCount: number;
  /** Beyond 3 IQR. */
  extreme: FlaggedValue[];
  extremeCount: number;
  /** |e / √(MS_W (1 − 1/nᵢ))| > 3. */
  largeResidual: FlaggedValue[];
  largeResidualCount: number;
}

export interface OutlierReport {
  available: true;
  fences: { mild: number; extreme: number; quantileDefinition: string };
  residualRule: string;
  groups: GroupOutliers[];
  totalMild: number;
  totalExtreme: number;
  totalLargeResidual: number;
}

/**
 * Outlier screening, two rules side by side:
 * 1. Tukey's fences per group: below Q1 − c·IQR or above Q3 + c·IQR, c = 1.5 (mild) and 3
 *    (extreme), quartiles by linear interpolation (type 7).
 * 2. Internally studentized residuals of the one-way model, rᵢⱼ = (xᵢⱼ − x̄ᵢ)/√(MS_W(1 − 1/nᵢ)),
 *    where 1 − 1/nᵢ is one minus the leverage of a value in a group of nᵢ; |r| > 3 is flagged.
 * References: Tukey, J. W. (1977). Exploratory Data Analysis, ch. 2; Cook, R. D. & Weisberg,
 * S. (1982). Residuals and Influence in Regression, §2.2 (studentized residuals).
 * Example: values 1..9 and 40 in one group → 40 is beyond the 3 IQR fence (Q3 = 7.75, IQR = 4.5).
 * Cost: O(flagged values) after the shared sorts, plus reading the data in order until the
 * listed values are found (all of it only when a flagged value comes last).
 */
export function outliers(input: SampleInput): OutlierReport | Unavailable {
  const sample = prepareSample(input);
  const moments = sample.groups.map((g) => groupMoments(g));
  let ssw = 0;
  let N = 0;
  for (const m of moments) {
    ssw += m.ss;
    N += m.n;
  }
  const dfw = N - sample.groups.length;
  const msw = dfw > 0 ? ssw / dfw : 0;
  let totalMild = 0;
  let totalExtreme = 0;
  let totalLargeResidual = 0;
  const groups = sample.groups.map((g, gi) => {
    const sorted = sortedValues(g);
    const n = sorted.length;
    const m = moments[gi] as (typeof moments)[number];
    const q1 = n > 0 ? quantileSorted(sorted, 0.25) : 0;
    const q3 = n > 0 ? quantileSorted(sorted, 0.75) : 0;
    const iqr = q3 - q1;
    const lowMild = q1 - MILD_FENCE_IQR * iqr;
    const highMild = q3 + MILD_FENCE_IQR * iqr;
    const lowExtreme = q1 - EXTREME_FENCE_IQR * iqr;
    const highExtreme = q3 + EXTREME_FENCE_IQR * iqr;
    const scale = msw > 0 && n > 1 ? Math.sqrt(msw * (1 - 1 / n)) : 0;
    const quart = n > 0 ? quartilesOriginal(sample, sorted) : undefined;
    const mildFences = quart?.fences(MILD_FENCE_IQR) ?? { lower: 0, upper: 0 };
    const extremeFences = quart?.fences(EXTREME_FENCE_IQR) ?? { lower: 0, upper: 0 };
    const out: GroupOutliers = {
      group: g.name,
      lowerFence: mildFences.lower,
      upperFence: mildFences.upper,
      lowerExtremeFence: extremeFences.lower,
      upperExtremeFence: extremeFences.upper,
      mild: [],
      mildCount: 0,
      extreme: [],
      extremeCount: 0,
      largeResidual: [],
      largeResidualCount: 0,
    };
    const centred = g.centred;
    const rows = g.rows;
    const flag = (list: FlaggedValue[], i: number, r: number): void => {
      if (list.length >= MAX_LISTED_OUTLIERS) return;
      const item: FlaggedValue = { value: toOriginal(sample, centred[i] as number), row: rows?.[i] ?? i + 1 };
      if (scale > 0) item.studentizedResidual = r;
      list.push(item);
    };
    const limit = scale * STUDENTIZED_RESIDUAL_LIMIT;
    const isLargeResidual = (x: number): boolean => {
      const e = x - m.mean;
      return scale > 0 && (e > limit || e < -limit);
    };
    // Counts from the sorted values: x < fence and x − mean < −limit hold on a run at the
    // bottom, x > fence and x − mean > limit on a run at the top (both monotone in x), so only
    // the flagged values are read; a value in the bottom run is never counted again at the top.
    const mildSide = (x: number) => x < lowMild || x > highMild;
    const extremeSide = (x: number) => x < lowExtreme || x > highExtreme;
    const count = (x: number) => {
      if (extremeSide(x)) out.extremeCount++;
      else out.mildCount++;
    };
    let bottom = 0;
    while (bottom < n && (sorted[bottom] as number) < lowMild) count(sorted[bottom++] as number);
    for (let i = n - 1; i >= bottom && (sorted[i] as number) > highMild; i--) count(sorted[i] as number);
    if (scale > 0) {
      bottom = 0;
      while (bottom < n && (sorted[bottom] as number) - m.mean < -limit) bottom++;
      out.largeResidualCount = bottom;
      for (let i = n - 1; i >= bottom && (sorted[i] as number) - m.mean > limit; i--)
        out.largeResidualCount++;
    }
    // The listed values come in input order: read the data only until every list is complete
    // (checked only when a value is listed, so the loop stays two comparisons a value).
    const complete = () =>
      out.extreme.length >= Math.min(out.extremeCount, MAX_LISTED_OUTLIERS) &&
      out.mild.length >= Math.min(out.mildCount, MAX_LISTED_OUTLIERS) &&
      out.largeResidual.length >= Math.min(out.largeResidualCount, MAX_LISTED_OUTLIERS);
    const mean = m.mean;
    const checkResiduals = scale > 0;
    for (let i = 0; i < n && !complete(); i++) {
      for (; i < n; i++) {
        const x = centred[i] as number;
        const e = x - mean;
        if (x < lowMild || x > highMild || (checkResiduals && (e > limit || e < -limit))) break;
      }
      if (i === n) break;
      const x = centred[i] as number;
      if (mildSide(x)) {
        const r = scale > 0 ? (x - mean) / scale : 0;
        flag(extremeSide(x) ? out.extreme : out.mild, i, r);
      }
      if (isLargeResidual(x)) flag(out.largeResidual, i, (x - mean) / scale);
    }
    totalMild += out.mildCount;
    totalExtreme += out.extremeCount;
    totalLargeResidual += out.largeResidualCount;
    return out;
  });
  return {
    available: true,
    fences: {
      mild: MILD_FENCE_IQR,
      extreme: EXTREME_FENCE_IQR,
      quantileDefinition: "linear interpolation between order statistics (type 7)",
    },
    residualRule: `internally studentized residual (x − group mean) / √(MS_within · (1 − 1/n)), flagged beyond ±${STUDENTIZED_RESIDUAL_LIMIT}`,
    groups,
    totalMild,
    totalExtreme,
    totalLargeResidual,
  };
}
