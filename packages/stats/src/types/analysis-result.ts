/**
 * The precise shape of `analyze()`'s result: the one contract the command line's --json, the
 * API (stored analyses, checks) and the web app read. Parts that may be missing are
 * discriminated unions on `available` (`{available: true, …} | {available: false, reason}`);
 * post-hoc families are an array of pairs or Unavailable (tell them apart with Array.isArray).
 * Every number is finite: `analyze()`'s last pass withholds any that is not (and says so in
 * `warnings`), a defect path the types do not spell out.
 */
import type { ResolvedOptions } from "../analyze-options.js";
import type { BartlettResult } from "../assumptions/bartlett.js";
import type { LeveneResult } from "../assumptions/levene.js";
import type { OutlierReport } from "../assumptions/outliers.js";
import type { QqPlot } from "../assumptions/qq-plot.js";
import type { GroupNormalityReport } from "../assumptions/group-normality.js";
import type { SizeAwareOutlierReport } from "../assumptions/size-aware-outliers.js";
import type { TestDecision } from "../choice/decide-test.js";
import type { ErrorRateCheckResult } from "../choice/error-rate-check.js";
import type { TrimmedMeansAnovaResult } from "../omnibus/trimmed-means-anova.js";
import type { SensitivityAnalyses } from "../choice/sensitivity.js";
import type { CodedText } from "../vocabulary/coded-text.js";
import type { GroupDescription } from "../descriptives/describe.js";
import type { EtaSquaredInterval } from "../effect-sizes/eta-squared-ci.js";
import type { KruskalWallisResult } from "../omnibus/kruskal-wallis.js";
import type { OneWayAnovaResult } from "../omnibus/one-way-anova.js";
import type { WelchAnovaResult } from "../omnibus/welch-anova.js";
import type { FamilyWiseErrorResult } from "../planning/family-wise-error.js";
import type { DunnettPair } from "../posthoc/control-comparison-types.js";
import type { DunnPair } from "../posthoc/dunn.js";
import type { GamesHowellPair } from "../posthoc/games-howell.js";
import type { TukeyKramerPair } from "../posthoc/tukey-kramer.js";
import type { WelchVsControlPair } from "../posthoc/welch-vs-control-holm.js";
import type { Adjustment } from "../vocabulary/ids.js";
import type { Unavailable } from "./group-summary.js";

export type ErrorRateCheckPart = ErrorRateCheckResult | Unavailable;

/** A part that may be unavailable. */
export type Part<T extends { available: true }> = T | Unavailable;

/** Classic ANOVA with the 95% interval of η² (noncentral-F inversion) beside the point estimate. */
export type AnovaPart = Part<OneWayAnovaResult & { etaSquaredCi: EtaSquaredInterval }>;
export type WelchPart = Part<WelchAnovaResult>;
export type KruskalWallisPart = Part<KruskalWallisResult>;
export type LevenePart = Part<LeveneResult>;
export type BartlettPart = Part<BartlettResult>;
export type OutliersPart = Part<OutlierReport>;
export type QqPart = Part<QqPlot>;
export type FamilyWiseErrorPart = Part<FamilyWiseErrorResult & { available: true }>;

/** Shapiro–Wilk within one group; unavailable for fewer than 3 or more than 5000 values. */
export type ShapiroWilkGroup =
  | { available: true; group: string; n: number; W: number; p: number }
  | { available: false; group: string; n: number; reason: string };

/** Shapiro–Wilk on the pooled within-group residuals. */
export type ShapiroWilkResidualsPart = Part<{ available: true; n: number; W: number; p: number }>;

/** One post-hoc family: its pairs, or why it could not run. */
export type PairsOrUnavailable<P> = P[] | Unavailable;

/** Families computed against the control (present when a control group is named). */
export interface ControlFamilies {
  control: string;
  dunnett: PairsOrUnavailable<DunnettPair>;
  welchHolm: PairsOrUnavailable<WelchVsControlPair>;
  /** Dunn's pairs with the control, re-adjusted over those k − 1 comparisons. */
  dunn: PairsOrUnavailable<DunnPair>;
}

export interface PosthocPart {
  tukey: PairsOrUnavailable<TukeyKramerPair>;
  gamesHowell: PairsOrUnavailable<GamesHowellPair>;
  dunn: PairsOrUnavailable<DunnPair>;
  adjust: Adjustment;
  dunnTwoSided: true;
  control?: ControlFamilies;
}

export interface AnalysisData {
  k: number;
  totalN: number;
  totalMissing: number;
  centring: string;
  offset: number;
}

/** The one JSON-serializable result of `analyze`. */
export interface AnalysisResult {
  engineVersion: string;
  options: ResolvedOptions;
  data: AnalysisData;
  groups: GroupDescription[];
  anova: AnovaPart;
  welch: WelchPart;
  kruskalWallis: KruskalWallisPart;
  levene: LevenePart;
  brownForsythe: LevenePart;
  bartlett: BartlettPart;
  shapiroWilk: ShapiroWilkGroup[];
  shapiroWilkResiduals: ShapiroWilkResidualsPart;
  /** Largest SD / smallest SD. */
  sdRatio: number | Unavailable;
  outliers: OutliersPart;
  qq: QqPart;
  posthoc: PosthocPart;
  familyWiseError: FamilyWiseErrorPart;
  /** The test of record under the plan (the key keeps its first name: the command line's JSON contract). */
  recommendation: TestDecision;
  /** Heteroscedastic test on 20% trimmed means: a sensitivity analysis, never the primary test. */
  trimmedMeans: TrimmedMeansAnovaResult | Unavailable;
  /** Shapiro–Wilk per group on standardized residuals, with a reading per group. */
  groupNormality: GroupNormalityReport | Unavailable;
  /** Far values by fences that account for each group's size (Grubbs-type). */
  sizeAwareOutliers: SizeAwareOutlierReport | Unavailable;
  /** The other omnibus tests beside the primary one, with a sentence where they disagree. */
  sensitivity: SensitivityAnalyses | Unavailable;
  /** The seeded simulation of each candidate test's error rate with data like these. */
  errorRateCheck: ErrorRateCheckPart;
  /** Where a check speaks against the plan's test: what it means and which sensitivity analysis answers it. */
  checkWarnings: CodedText[];
  warnings: string[];
}

/** True for a part that was computed (narrows away Unavailable). */
export function isAvailable<T extends object>(
  x: T | Unavailable | null | undefined,
): x is Exclude<T, Unavailable> {
  return !!x && typeof x === "object" && (x as { available?: unknown }).available !== false;
}

/** The reason a part is unavailable, or a plain fallback. */
export function reasonOf(x: unknown, fallback = "it could not be computed"): string {
  return x && typeof x === "object" && typeof (x as { reason?: unknown }).reason === "string"
    ? (x as { reason: string }).reason
    : fallback;
}
