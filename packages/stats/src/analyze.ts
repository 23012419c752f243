import { resolveOptions, type AnalyzeOptions } from "./analyze-options.js";
import { bartlett } from "./assumptions/bartlett.js";
import { levene } from "./assumptions/levene.js";
import { outliers } from "./assumptions/outliers.js";
import { qqPlot } from "./assumptions/qq-plot.js";
import { sdRatio as sdRatioOf } from "./assumptions/sd-ratio.js";
import { SHAPIRO_WILK_MAX_N, shapiroWilk } from "./assumptions/shapiro-wilk.js";
import { groupNormality } from "./assumptions/group-normality.js";
import { sizeAwareOutliers } from "./assumptions/size-aware-outliers.js";
import { checkWarnings } from "./choice/check-warnings.js";
import { errorRateCheck } from "./choice/error-rate-check.js";
import { trimmedMeansAnova } from "./omnibus/trimmed-means-anova.js";
import { decideTest } from "./choice/decide-test.js";
import { planTest } from "./choice/plan-test.js";
import { sensitivityAnalyses, type SensitivityAnalyses } from "./choice/sensitivity.js";
import { describeGroups } from "./descriptives/describe.js";
import { StatsInputError } from "./errors.js";
import type { GroupInput } from "./numeric/centred-sample.js";
import { pooledResiduals } from "./numeric/pooled-residuals.js";
import { prepareSample } from "./numeric/prepare-sample.js";
import { requireGroupSizes } from "./numeric/require-group-sizes.js";
import { sortedValues } from "./numeric/sorted-values.js";
import { kruskalWallis } from "./omnibus/kruskal-wallis.js";
import { oneWayAnova } from "./omnibus/one-way-anova.js";
import { welchAnova } from "./omnibus/welch-anova.js";
import { ENGINE_VERSION } from "./version.js";
import { etaSquaredCi } from "./effect-sizes/eta-squared-ci.js";
import type { Unavailable } from "./types/group-summary.js";
import { runPosthoc, SHIFT_INTERVALS_FULL_N } from "./posthoc-plan.js";
import type {
  AnalysisResult,
  ErrorRateCheckPart,
  ShapiroWilkResidualsPart,
} from "./types/analysis-result.js";

export interface AnalyzeInput {
  groups: readonly GroupInput[];
  options?: AnalyzeOptions;
}

/** The result's precise type lives in types/analysis-result.ts (re-exported here for callers). */
export type { AnalysisResult } from "./types/analysis-result.js";

/** Runs one part; an input problem specific to that part becomes its Unavailable reason. */
function part<T>(run: () => T): T | Unavailable {
  try {
    return run();
  } catch (e) {
    if (e instanceof StatsInputError) return { available: false, reason: e.message };
    throw e;
  }
}

/**
 * The full comparison of k independent groups in one call: descriptives, classic ANOVA with
 * effect sizes, Welch's ANOVA, Kruskal–Wallis, assumption checks (Shapiro–Wilk per group and
 * on pooled residuals, Levene, Brown–Forsythe, Bartlett, SD ratio, outliers, Q–Q data), the
 * post-hoc families, the family-wise error rate and the recommended test with its reasons.
 * Values may be numbers or decimal text; null, "", "NA" are missing (excluded, counted).
 * The data are parsed and centred once (exactly, on the decimal text) and every part reuses
 * that, and the per-group sorts. Deterministic: the permutation p-value uses a fixed seed.
 * Throws StatsInputError for fewer than two groups, a group with fewer than two values,
 * non-numeric text (naming the first offending values) or infinite values.
 * Example: analyze({ groups: [{ name: "A", values: [1, 2, 3] }, { name: "B", values: ["4", "5", "6.5"] }] }).anova.F
 * Cost: O(N log N) for the per-group sorts, O(N·k) for ranks, O(N) for the rest.
 */
export function analyze(input: AnalyzeInput): AnalysisResult {
  if (!input || !Array.isArray(input.groups))
    throw new StatsInputError("The analysis needs a list of groups, each with a name and values");
  const names = input.groups.map((g) => g.name);
  const duplicate = names.find((n, i) => names.indexOf(n) !== i);
  if (duplicate !== undefined)
    throw new StatsInputError(`Group names must be unique; '${duplicate}' appears more than once`);
  const options = resolveOptions(input.options ?? {}, names);
  const sample = prepareSample(input.groups);
  requireGroupSizes(sample, "The analysis", 2);
  const warnings: string[] = [];

  const groups = describeGroups(sample);
  const totalN = groups.reduce((s, g) => s + g.n, 0);
  const totalMissing = groups.reduce((s, g) => s + g.missing, 0);
  if (totalMissing > 0) {
    const which = groups.filter((g) => g.missing > 0).map((g) => `'${g.name}' ${g.missing}`);
    warnings.push(
      `${totalMissing} missing value${totalMissing === 1 ? " was" : "s were"} excluded (${which.join(", ")}).`,
    );
  }
  const constantGroups = groups
    .filter((g) => typeof g.sd === "number" && g.sd === 0)
    .map((g) => `'${g.name}'`);
  const allIdentical = groups.every(
    (g) => g.min === groups[0]?.min && g.max === groups[0]?.max && g.min === g.max,
  );
  if (allIdentical) {
    warnings.push(
      "All values are identical across all groups, so no test can detect a difference; the tests report why they cannot run.",
    );
  } else if (constantGroups.length > 0) {
    warnings.push(
      `Zero variance in group${constantGroups.length > 1 ? "s" : ""} ${constantGroups.join(", ")}: Welch's ANOVA and Bartlett's test cannot run (they divide by or take the log of each group's variance), and Games–Howell compares a pair only when at least one of its two groups varies; the other results are reported.`,
    );
  }

  const anovaCore = part(() => oneWayAnova(sample));
  // η² with its 95% interval from the noncentral F (Steiger 2004), beside the point estimate.
  const anova = anovaCore.available
    ? {
        ...anovaCore,
        etaSquaredCi: part(() => etaSquaredCi(anovaCore.F, anovaCore.df1, anovaCore.df2, 0.95)),
      }
    : anovaCore;
  const welch = part(() => welchAnova(sample));
  const kw = part(() => kruskalWallis(sample));
  // Sensitivity analysis for means with heavy tails or far values (Yuen 1974; k-group Welch form).
  const trimmed = part(() => trimmedMeansAnova(sample));
  const lev = part(() => levene(sample, "mean"));
  const bf = part(() => levene(sample, "median"));
  const bart = part(() => bartlett(sample));
  const shapiro = sample.groups.map((g) => {
    const r = shapiroWilk(sortedValues(g));
    return r.available
      ? { available: true as const, group: g.name, n: r.n, W: r.W, p: r.p }
      : { available: false as const, group: g.name, n: g.centred.length, reason: r.reason };
  });
  // The full sorted residuals are needed only where Shapiro–Wilk applies (N ≤ 5000).
  const swResiduals =
    totalN <= SHAPIRO_WILK_MAX_N
      ? shapiroWilk(pooledResiduals(sample))
      : ({
          available: false,
          reason: `The Shapiro–Wilk approximation is valid up to ${SHAPIRO_WILK_MAX_N} values; the pooled residuals number ${totalN}, so skewness and kurtosis describe the shape instead`,
        } as const);
  if (!swResiduals.available && totalN > SHAPIRO_WILK_MAX_N) warnings.push(swResiduals.reason + ".");
  const ratio = sdRatioOf(sample);
  const sdRatio: number | Unavailable = ratio.available ? ratio.ratio : ratio;
  const outlierReport = part(() => outliers(sample));
  // The checks that inform: normality per group (not pooled) and outlier fences by group size.
  const normalityByGroup = part(() => groupNormality(sample, options.alpha));
  const outliersBySize = part(() => sizeAwareOutliers(sample));
  const qq = qqPlot(sample);

  const plan =
    options.plan ??
    planTest({
      independent: options.independent,
      scale: options.scale,
      question: options.question,
      comparisons: options.comparisons,
      policy: options.policy,
      plannedSizes: options.plannedSizes,
    });
  const reasonIfUnavailable = (x: object): string | null =>
    "available" in x && x.available === false ? String((x as Unavailable).reason) : null;
  const recommendation = decideTest(plan, {
    groups: groups.map((g) => ({ name: g.name, n: g.n, sd: typeof g.sd === "number" ? g.sd : 0 })),
    comparisons: options.comparisons,
    unavailable: {
      anova: reasonIfUnavailable(anova),
      welch: reasonIfUnavailable(welch),
      "kruskal-wallis": reasonIfUnavailable(kw),
    },
  });
  const posthoc = runPosthoc(
    sample,
    groups,
    anova,
    options,
    recommendation.test === "kruskal-wallis" || totalN <= SHIFT_INTERVALS_FULL_N,
  );
  if (allIdentical)
    recommendation.caveats.unshift({
      code: "caveat.all-identical",
      params: {},
      text: "All values are identical, so none of the tests can be computed.",
    });
  const groupSpreads = groups.map((g) => ({ name: g.name, n: g.n, sd: typeof g.sd === "number" ? g.sd : 0 }));
  const checkNotes = checkWarnings(recommendation, {
    alpha: options.alpha,
    groups: groupSpreads,
    normality: normalityByGroup.available
      ? normalityByGroup.groups.map((g) =>
          typeof g.p === "number"
            ? { group: g.group, p: g.p }
            : { group: g.group, available: false as const },
        )
      : [],
    outliers: outliersBySize.available
      ? outliersBySize.groups.map((g) => ({ group: g.group, count: g.flaggedCount }))
      : [],
  });
  const pOf = (x: object) =>
    "p" in x && typeof x.p === "number"
      ? { available: true as const, p: x.p }
      : { available: false as const, reason: reasonIfUnavailable(x) ?? "not computed" };
  const sensitivity: SensitivityAnalyses | Unavailable =
    recommendation.test === "out-of-scope"
      ? { available: false, reason: "The design is outside what these tests cover." }
      : sensitivityAnalyses(recommendation.test, options.alpha, {
          anova: pOf(anova),
          welch: pOf(welch),
          "kruskal-wallis": pOf(kw),
          "trimmed-means": pOf(trimmed),
        });
  // How often each candidate test falsely finds a difference in data like these (seeded).
  const errorRate: ErrorRateCheckPart =
    options.errorRateCheck === false
      ? { available: false, reason: "The error-rate check was not asked for." }
      : part(() => {
          const { seed, runs } = options.errorRateCheck as { seed: number; runs: number | undefined };
          return errorRateCheck(sample, {
            alpha: options.alpha,
            seed,
            ...(runs !== undefined ? { runs } : {}),
          });
        });

  return finite<AnalysisResult>(
    {
      engineVersion: ENGINE_VERSION,
      options,
      data: {
        k: sample.groups.length,
        totalN,
        totalMissing,
        centring: sample.centring,
        offset: sample.offset,
      },
      groups,
      anova,
      welch,
      kruskalWallis: kw,
      levene: lev,
      brownForsythe: bf,
      bartlett: bart,
      shapiroWilk: shapiro,
      shapiroWilkResiduals: (swResiduals.available
        ? { available: true, n: swResiduals.n, W: swResiduals.W, p: swResiduals.p }
        : swResiduals) satisfies ShapiroWilkResidualsPart,
      sdRatio,
      outliers: outlierReport,
      qq,
      posthoc: posthoc.posthoc,
      familyWiseError: posthoc.familyWiseError,
      recommendation,
      trimmedMeans: trimmed,
      groupNormality: normalityByGroup,
      sizeAwareOutliers: outliersBySize,
      sensitivity,
      errorRateCheck: errorRate,
      checkWarnings: checkNotes,
      warnings,
    },
    warnings,
  );
}

/**
 * Last line of defence for the output contract (no NaN, Infinity or undefined): any
 * non-finite number is replaced by an Unavailable object and noted in the warnings, so a
 * defect shows up as a readable reason rather than as broken JSON. Cost: O(size of result).
 */
function finite<T>(result: T, warnings: string[]): T {
  const visit = (x: unknown, path: string): unknown => {
    if (typeof x === "number" && !Number.isFinite(x)) {
      warnings.push(`Internal: ${path} was not a finite number and has been withheld.`);
      return { available: false, reason: "the value could not be computed as a finite number" };
    }
    if (Array.isArray(x)) return x.map((v, i) => visit(v, `${path}[${i}]`));
    if (x && typeof x === "object") {
      const out: Record<string, unknown> = {};
      for (const [k, v] of Object.entries(x))
        if (v !== undefined) out[k] = visit(v, path ? `${path}.${k}` : k);
      return out;
    }
    return x;
  };
  return visit(result, "") as T;
}
