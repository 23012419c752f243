/**
 * @waymark/stats — the public API of Waymark's statistics engine. Pure computation, no I/O
 * (the command line in ./cli is the one exception and is not exported here).
 */
export { ENGINE_VERSION } from "./version.js";
export { StatsInputError } from "./errors.js";
export type { GroupSummary, GroupValues, Unavailable } from "./types/group-summary.js";

// The one-call analysis and its options.
export { analyze, type AnalysisResult, type AnalyzeInput } from "./analyze.js";
export {
  resolveOptions,
  type AnalyzeOptions,
  type ResolvedOptions,
  type Adjustment,
  type Policy,
  type Scale,
  type Comparisons,
} from "./analyze-options.js";

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

// Choosing the test.
export * from "./choice/thresholds.js";
export {
  recommendTest,
  type DesignAnswers,
  type CheckResults,
  type Recommendation,
  type OmnibusTest,
  type PosthocMethod,
} from "./choice/recommend-test.js";

// Distributions.
export * from "./distributions/index.js";

// Reporting: shared number formatting and plain-language readings (web app, API report, CLI).
export { formatDf, formatP, formatPercent, formatStat, formatUnit } from "./reporting/format.js";
export {
  checkReadings,
  midSentence,
  omnibusSentence,
  resultSummary,
  TEST_NAMES,
  type Reading,
} from "./reporting/readings.js";
export type { ResultView } from "./reporting/result-view.js";

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
