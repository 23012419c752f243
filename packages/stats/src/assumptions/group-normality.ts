import type { SampleInput } from "../numeric/centred-sample.js";
import { groupMoments } from "../numeric/group-moments.js";
import { prepareSample } from "../numeric/prepare-sample.js";
import { sortedValues } from "../numeric/sorted-values.js";
import { formatP } from "../reporting/format.js";
import type { CheckReading } from "./check-reading.js";
import { SHAPIRO_WILK_MAX_N, shapiroWilk } from "./shapiro-wilk.js";

export interface GroupNormality {
  group: string;
  n: number;
  /** Shapiro–Wilk W and p on the group's standardized residuals; absent when not computable. */
  W?: number;
  p?: number;
  reading: CheckReading;
}

export interface GroupNormalityReport {
  available: true;
  method: "Shapiro–Wilk per group on standardized residuals";
  alpha: number;
  groups: GroupNormality[];
  /** One summary reading across groups. */
  summary: CheckReading;
}

/**
 * Normality checked group by group: each group's residuals are standardized, zᵢ = (xᵢ − x̄)/s,
 * and tested with Shapiro–Wilk (Royston's AS R94), each with its own plain reading.
 * Why per group and not pooled: residuals pooled across groups with different spreads form a
 * scale mixture, which is heavy-tailed even when every group is normal, so a pooled test
 * rejects because of the spreads, not the shapes (see the methods notes). The check informs —
 * a departure is a reason to look at the group's Q–Q plot and the sensitivity analyses, not to
 * switch the planned test; with several groups some departures come by chance (about α of them).
 * References: Shapiro & Wilk (1965), Biometrika 52, 591–611; Royston (1995), Applied
 * Statistics 44, 547–551.
 * Example: groupNormality(groups).groups[0] → { group: "A", n: 12, W: 0.79, p: 0.0078,
 *   reading: { code: "normality.group-departs", params: { group: "A", p: 0.0078, W: 0.79 }, … } }.
 * Cost: O(N log N) for the sorts plus n/2 normal quantiles per group.
 */
export function groupNormality(input: SampleInput, alpha = 0.05): GroupNormalityReport {
  const sample = prepareSample(input);
  const groups = sample.groups.map((g): GroupNormality => {
    const n = g.centred.length;
    const m = groupMoments(g);
    if (n < 3) {
      return {
        group: g.name,
        n,
        reading: {
          code: "normality.group-too-small",
          params: { group: g.name, n },
          text: `Group '${g.name}' has ${n} value${n === 1 ? "" : "s"}; the shape of a group cannot be checked with fewer than 3.`,
        },
      };
    }
    if (!(m.ss > 0)) {
      return {
        group: g.name,
        n,
        reading: {
          code: "normality.group-constant",
          params: { group: g.name, n },
          text: `All values in group '${g.name}' are equal, so its shape cannot be checked.`,
        },
      };
    }
    if (n > SHAPIRO_WILK_MAX_N) {
      return {
        group: g.name,
        n,
        reading: {
          code: "normality.group-too-large",
          params: { group: g.name, n, limit: SHAPIRO_WILK_MAX_N },
          text: `Group '${g.name}' has ${n} values, more than the ${SHAPIRO_WILK_MAX_N} the Shapiro–Wilk approximation covers; its skewness and kurtosis and the Q–Q plot describe the shape instead.`,
        },
      };
    }
    const sd = Math.sqrt(m.ss / (n - 1));
    // (x − mean)/sd is monotone in x, so mapping the shared sorted values gives the sorted
    // standardized residuals without another sort (the same doubles as sorting them).
    const sorted = sortedValues(g);
    const z = new Float64Array(n);
    for (let i = 0; i < n; i++) z[i] = ((sorted[i] as number) - m.mean) / sd;
    const sw = shapiroWilk(z);
    if (!sw.available) {
      return {
        group: g.name,
        n,
        reading: { code: "normality.group-not-computed", params: { group: g.name }, text: sw.reason },
      };
    }
    const departs = sw.p < alpha;
    return {
      group: g.name,
      n,
      W: sw.W,
      p: sw.p,
      reading: departs
        ? {
            code: "normality.group-departs",
            params: { group: g.name, n, W: sw.W, p: sw.p },
            text: `The values in group '${g.name}' depart from a normal shape (Shapiro–Wilk W = ${sw.W.toFixed(3)}, p ${formatP(sw.p)}); look at its Q–Q plot and at the sensitivity analyses.`,
          }
        : {
            code: "normality.group-consistent",
            params: { group: g.name, n, W: sw.W, p: sw.p },
            text:
              `The values in group '${g.name}' are consistent with a normal shape (Shapiro–Wilk W = ${sw.W.toFixed(3)}, p ${formatP(sw.p)})` +
              (n < 10 ? `, though with ${n} values the check can only detect large departures.` : "."),
          },
    };
  });
  const departing = groups.filter((g) => g.reading.code === "normality.group-departs").map((g) => g.group);
  const checked = groups.filter((g) => g.p !== undefined).length;
  const summary: CheckReading =
    departing.length === 0
      ? {
          code: "normality.all-consistent",
          params: { checked },
          text:
            checked === 0
              ? "No group could be checked for shape."
              : `No group's values depart clearly from a normal shape (${checked} of ${groups.length} groups checked).`,
        }
      : {
          code: "normality.some-depart",
          params: { groups: departing, checked },
          text: `${departing.length} of ${checked} groups depart from a normal shape (${departing.map((g) => `'${g}'`).join(", ")}). With ${checked} groups tested at α = ${alpha}, about ${(checked * alpha).toFixed(1)} would depart by chance; this informs the reading of the results and does not change the planned test.`,
        };
  return {
    available: true,
    method: "Shapiro–Wilk per group on standardized residuals",
    alpha,
    groups,
    summary,
  };
}
