import { tQuantile } from "../distributions/t.js";
import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { sortedValues } from "../numeric/sorted-values.js";
import { toOriginal } from "../numeric/to-original.js";
import type { CheckReading } from "./check-reading.js";
import { MAX_LISTED_OUTLIERS } from "./outliers.js";

/** Chance that a normal group of any size has a value flagged. */
export const OUTLIER_FALSE_FLAG_RATE = 0.05;

export interface SizeAwareFlag {
  value: number;
  /** The value's row number as given with the input, else its 1-based position in the group. */
  row: number;
  /** (x − x̄)/s. */
  z: number;
}

export interface SizeAwareOutlierGroup {
  group: string;
  n: number;
  /** The |z| beyond which a value is flagged for this n (Grubbs' two-sided critical value); absent for n < 3. */
  criticalZ?: number;
  /** x̄ ∓ criticalZ·s in the data's units. */
  lowerFence?: number;
  upperFence?: number;
  flagged: SizeAwareFlag[];
  flaggedCount: number;
  reading: CheckReading;
}

export interface SizeAwareOutlierReport {
  available: true;
  method: "Grubbs-type fence per group size";
  /** Chance that a group of normal values, of any size, has a value flagged. */
  falseFlagRate: number;
  groups: SizeAwareOutlierGroup[];
  summary: CheckReading;
}

/**
 * Grubbs' two-sided critical value for the largest |x − x̄|/s among n normal values at level α:
 * G = ((n − 1)/√n)·√(t²/(n − 2 + t²)), t the upper α/(2n) quantile of t with n − 2 df.
 * Reference: Grubbs, F. E. (1969). Procedures for detecting outlying observations in samples.
 * Technometrics 11, 1–21 (the formula as given in the NIST/SEMATECH e-Handbook of Statistical
 * Methods, §1.3.5.17). Example: grubbsCritical(10) → 2.28995 (α = .05). Cost: one t quantile.
 */
export function grubbsCritical(n: number, alpha = OUTLIER_FALSE_FLAG_RATE): number {
  const t = tQuantile(1 - alpha / (2 * n), n - 2);
  return ((n - 1) / Math.sqrt(n)) * Math.sqrt((t * t) / (n - 2 + t * t));
}

/**
 * Outlier fences that account for group size: a value is flagged when its distance from the
 * group mean in SDs, |x − x̄|/s, exceeds Grubbs' critical value for the group's n, so a group of
 * normal values is flagged with probability about 5% whatever its size (at most 5%: the
 * critical value comes from a Bonferroni bound, which is tight here). A fixed fence such as
 * 3 IQR is not: under normality it flags about 13.5% of groups of 5 and 1.9% of groups of 20
 * (measured, see the methods notes). Every value beyond the fence is listed (at most 50 per
 * group; the count is complete); one pass, so two outliers can mask each other in a small
 * group. The reading asks the analyst to check the value — it does not change the analysis.
 * Reference: Grubbs (1969), Technometrics 11, 1–21; Tukey's fences stay in `outliers` for
 * description.
 * Example: values 10, 11, 9, 10, 12, 10, 11, 9, 10, 30 → 30 flagged (z = 2.82 > 2.29 for n = 10).
 * Cost: O(flagged values) after the shared sorts, plus reading the data in order until the
 * listed values are found; one t quantile per group.
 */
export function sizeAwareOutliers(input: SampleInput): SizeAwareOutlierReport {
  const sample = prepareSample(input);
  const groups = sample.groups.map((g): SizeAwareOutlierGroup => {
    const n = g.centred.length;
    const m = groupMoments(g);
    if (n < 3 || !(m.ss > 0)) {
      const tooSmall = n < 3;
      return {
        group: g.name,
        n,
        flagged: [],
        flaggedCount: 0,
        reading: {
          code: tooSmall ? "outliers.group-too-small" : "outliers.group-constant",
          params: { group: g.name, n },
          text: tooSmall
            ? `Group '${g.name}' has ${n} value${n === 1 ? "" : "s"}; outliers cannot be judged with fewer than 3.`
            : `All values in group '${g.name}' are equal, so none stands out.`,
        },
      };
    }
    const sd = Math.sqrt(m.ss / (n - 1));
    const G = grubbsCritical(n);
    const flagged: SizeAwareFlag[] = [];
    let flaggedCount = 0;
    // z is monotone in x, so the flagged values are a run at each end of the sorted values:
    // count them there, then read the data in order only until the listed ones are found.
    const sorted = sortedValues(g);
    for (let i = 0; i < n && ((sorted[i] as number) - m.mean) / sd < -G; i++) flaggedCount++;
    for (let i = n - 1; i >= 0 && ((sorted[i] as number) - m.mean) / sd > G; i--) flaggedCount++;
    const listed = Math.min(flaggedCount, MAX_LISTED_OUTLIERS);
    for (let i = 0; i < n && flagged.length < listed; i++) {
      const x = g.centred[i] as number;
      const z = (x - m.mean) / sd;
      if (Math.abs(z) > G) flagged.push({ value: toOriginal(sample, x), row: g.rows?.[i] ?? i + 1, z });
    }
    const lowerFence = toOriginal(sample, m.mean - G * sd);
    const upperFence = toOriginal(sample, m.mean + G * sd);
    const list = flagged.map((f) => `${f.value} (row ${f.row})`).join(", ");
    return {
      group: g.name,
      n,
      criticalZ: G,
      lowerFence,
      upperFence,
      flagged,
      flaggedCount,
      reading:
        flaggedCount === 0
          ? {
              code: "outliers.group-none",
              params: { group: g.name, n, criticalZ: G },
              text: `No value in group '${g.name}' lies further than ${G.toFixed(2)} SDs from its mean, the distance a group of ${n} normal values exceeds only 5% of the time.`,
            }
          : {
              code: "outliers.group-flagged",
              params: { group: g.name, n, count: flaggedCount, criticalZ: G },
              text: `Group '${g.name}' has ${flaggedCount === 1 ? "a value" : `${flaggedCount} values`} further than ${G.toFixed(2)} SDs from its mean (${list}), which a group of ${n} normal values shows only 5% of the time; check ${flaggedCount === 1 ? "it" : "them"} for entry or measurement errors and keep ${flaggedCount === 1 ? "it" : "them"} if genuine — the sensitivity analyses show whether the conclusion depends on ${flaggedCount === 1 ? "it" : "them"}.`,
            },
    };
  });
  const withFlags = groups.filter((g) => g.flaggedCount > 0).map((g) => g.group);
  const summary: CheckReading =
    withFlags.length === 0
      ? {
          code: "outliers.none",
          params: {},
          text: "No value stands out by more than its group's size makes likely.",
        }
      : {
          code: "outliers.some-groups",
          params: { groups: withFlags },
          text: `Values stand out in ${withFlags.map((g) => `'${g}'`).join(", ")}; with ${groups.length} groups, about ${(groups.length * OUTLIER_FALSE_FLAG_RATE).toFixed(2)} would be flagged by chance if all were normal.`,
        };
  return {
    available: true,
    method: "Grubbs-type fence per group size",
    falseFlagRate: OUTLIER_FALSE_FLAG_RATE,
    groups,
    summary,
  };
}
