/**
 * @waymark/stats — the public API of Waymark's statistics engine. Pure computation, no I/O
 * (the command line in ./cli is the one exception and is not exported here).
 */
export { ENGINE_VERSION } from "./version.js";
export { StatsInputError } from "./errors.js";
export type { GroupSummary, GroupValues, Unavailable } from "./types/group-summary.js";

// The one-call analysis and its options.
export { analyze, type AnalyzeInput } from "./analyze.js";
export * from "./types/analysis-result.js";
export { resolveOptions, type AnalyzeOptions, type ResolvedOptions } from "./analyze-options.js";

// Exact decimal input and shared numerics.
export { prepareSample } from "./numeric/prepare-sample.js";
export type {
  CentredSample,
  CentredGroup,
  GroupInput,
  SampleInput,
  CentringMethod,
} from "./numeric/centred-sample.js";
export { parseDecimal, MISSING_TEXT, type DecimalParse } from "./numeric/parse-decimal.js";
export { neumaierSum } from "./numeric/neumaier-sum.js";
export { centralMoments, type CentralMoments } from "./numeric/central-moments.js";
export { midranks, type Midranks } from "./numeric/midranks.js";
export { pooledResiduals } from "./numeric/pooled-residuals.js";

// Descriptives.
export { describeGroups, type GroupDescription } from "./descriptives/describe.js";
export { quantileSorted } from "./descriptives/quantile.js";
export { skewnessKurtosis } from "./descriptives/skewness-kurtosis.js";

// Omnibus tests.
export { oneWayAnova, type OneWayAnovaResult } from "./omnibus/one-way-anova.js";
export { welchAnova, type WelchAnovaResult } from "./omnibus/welch-anova.js";
export {
  kruskalWallis,
  type KruskalWallisResult,
  type KruskalWallisOptions,
} from "./omnibus/kruskal-wallis.js";
export { permutationKruskalWallis, type PermutationResult } from "./omnibus/permutation-kruskal-wallis.js";
export {
  trimmedMeansAnova,
  trimmedMoments,
  trimmedWelchF,
  DEFAULT_TRIM,
  type TrimmedMeansAnovaResult,
  type TrimmedGroupSummary,
} from "./omnibus/trimmed-means-anova.js";

// Assumption checks.
export { shapiroWilk, SHAPIRO_WILK_MAX_N, type ShapiroWilkResult } from "./assumptions/shapiro-wilk.js";
export { levene, type LeveneResult } from "./assumptions/levene.js";
export { bartlett, type BartlettResult } from "./assumptions/bartlett.js";
export {
  outliers,
  type OutlierReport,
  type GroupOutliers,
  type FlaggedValue,
} from "./assumptions/outliers.js";
export { qqPlot, type QqPlot } from "./assumptions/qq-plot.js";
export { sdRatio, type SdRatio } from "./assumptions/sd-ratio.js";
export type { CheckReading } from "./assumptions/check-reading.js";
export {
  groupNormality,
  type GroupNormality,
  type GroupNormalityReport,
} from "./assumptions/group-normality.js";
export {
  sizeAwareOutliers,
  grubbsCritical,
  OUTLIER_FALSE_FLAG_RATE,
  type SizeAwareOutlierReport,
  type SizeAwareOutlierGroup,
  type SizeAwareFlag,
} from "./assumptions/size-aware-outliers.js";

// Choosing the test.
export * from "./choice/thresholds.js";
export {
  planTest,
  CLASSIC_TO_WELCH_RULE,
  type TestPlan,
  type TestPlanDesign,
  type OutOfScopePlan,
  type SwitchRule,
  type OutcomeQuestion,
  type PlannedSizes,
} from "./choice/plan-test.js";
export { decideTest, type TestDecision, type DecisionEvidence } from "./choice/decide-test.js";
export { checkWarnings, type CheckEvidence } from "./choice/check-warnings.js";
export {
  sensitivityAnalyses,
  type SensitivityAnalyses,
  type SensitivityEntry,
} from "./choice/sensitivity.js";

export {
  errorRateCheck,
  errorRateRuns,
  ERROR_RATE_RUNS,
  ERROR_RATE_FULL_N,
  ERROR_RATE_MIN_RUNS,
  ERROR_RATE_MAX_RUNS,
  ERROR_RATE_MAX_N,
  ERROR_RATE_SEED,
  ERROR_RATE_SMALL_GROUP,
  type ErrorRateCheckResult,
  type ErrorRateCheckOptions,
  type TestErrorRate,
} from "./choice/error-rate-check.js";

// Distributions.
export * from "./distributions/index.js";

// Reporting: shared number formatting and plain-language readings (web app, API report, CLI).
export {
  formatDf,
  formatP,
  formatPercent,
  formatPWithExponent,
  formatStat,
  formatUnit,
  SMALLEST_WRITTEN_P,
} from "./reporting/format.js";
export {
  deviationSentence,
  errorRateSentences,
  primaryTestSentence,
  sensitivitySentences,
} from "./reporting/choice-sentences.js";
export {
  checkReadings,
  midSentence,
  omnibusSentence,
  resultSummary,
  type Reading,
  type ResultView,
} from "./reporting/readings.js";

export { comparisonRows, type ComparisonRow } from "./reporting/comparison-rows.js";

// One vocabulary: ids and the words users see for them (also @waymark/stats/vocabulary).
export * from "./vocabulary/index.js";

// Effect sizes (η² interval, Hedges' g, rank-biserial r).
export * from "./effect-sizes/index.js";

// Post-hoc comparisons and planning (power, sample size, family-wise error).
export * from "./posthoc/index.js";
export * from "./planning/index.js";

// Reading data values typed into files: one rule set for uploads and the command line.
export {
  readValue,
  MISSING_VALUE_TOKENS,
  MAX_VALUE_CHARS,
  type ValueReading,
  type ValueProblem,
} from "./input/read-value.js";
