/**
 * @waymark/stats/result — the result's types and the small readers of it (availability,
 * reasons, post-hoc rows), without the engine: light enough for the web bundle.
 */
export * from "./types/analysis-result.js";
export type { Unavailable } from "./types/group-summary.js";
export { comparisonRows, type ComparisonRow } from "./reporting/comparison-rows.js";
export type { GroupDescription } from "./descriptives/describe.js";
export type { TestDecision } from "./choice/decide-test.js";
export type { TestPlan, OutOfScopePlan, SwitchRule } from "./choice/plan-test.js";
export type { SensitivityAnalyses, SensitivityEntry } from "./choice/sensitivity.js";
export type { ErrorRateCheckResult, TestErrorRate } from "./choice/error-rate-check.js";
export type { Reading } from "./reporting/readings.js";
export type { OutlierReport, GroupOutliers, FlaggedValue } from "./assumptions/outliers.js";
export type { QqPlot } from "./assumptions/qq-plot.js";
export type { SdRatio } from "./assumptions/sd-ratio.js";
export {
  deviationSentence,
  errorRateSentences,
  primaryTestSentence,
  sensitivitySentences,
} from "./reporting/choice-sentences.js";
