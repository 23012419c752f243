/**
 * @waymark/stats/result — the result's types and the small readers of it (availability,
 * reasons, post-hoc rows), without the engine: light enough for the web bundle.
 */
export * from "./types/analysis-result.js";
export type { Unavailable } from "./types/group-summary.js";
export { comparisonRows, type ComparisonRow } from "./reporting/comparison-rows.js";
export type { GroupDescription } from "./descriptives/describe.js";
export type { Recommendation } from "./choice/recommend-test.js";
export type { Reading } from "./reporting/readings.js";
export type { OutlierReport, GroupOutliers, FlaggedValue } from "./assumptions/outliers.js";
export type { QqPlot } from "./assumptions/qq-plot.js";
export type { SdRatio } from "./assumptions/sd-ratio.js";
