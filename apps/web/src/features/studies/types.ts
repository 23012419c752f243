/**
 * The shapes the web app reads from the API. Engine output is typed narrowly and defensively:
 * any part may be `Unavailable`, and fields the engine may still rename are optional, so every
 * screen goes through `isAvailable` / `num` before showing a value.
 */

export interface Unavailable {
  available: false;
  reason: string;
}
export type Maybe<T> = T | Unavailable;

export function isUnavailable(x: unknown): x is Unavailable {
  return !!x && typeof x === "object" && (x as { available?: unknown }).available === false;
}

export function isAvailable<T>(x: Maybe<T> | undefined | null): x is T {
  return x !== undefined && x !== null && !isUnavailable(x);
}

/** A finite number, or null for anything else (missing, Unavailable, NaN, text). */
export function num(x: unknown): number | null {
  return typeof x === "number" && Number.isFinite(x) ? x : null;
}

/** The reason a value is missing, in plain words. */
export function reasonOf(x: unknown, fallback = "This value was not computed."): string {
  if (isUnavailable(x) && typeof x.reason === "string" && x.reason.trim()) return sentence(x.reason);
  return fallback;
}

function sentence(s: string): string {
  const t = s.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
}

// ---- Study --------------------------------------------------------------------------------

export type StudyContext = "general" | "clinical" | "safety-critical";
export type StudyStatus = "draft" | "in_review" | "approved";
export type TestId = "anova" | "welch" | "kruskal-wallis";
export type Policy = "classic-first" | "welch-first";
export type Adjustment = "holm" | "bonferroni" | "bh";
export type ComparisonSet = "all-pairs" | "vs-control";

export interface Person {
  id: number;
  displayName: string;
}

export interface DesignAnswers {
  independence?: "independent" | "paired" | "unsure";
  scale?: "continuous" | "ordinal" | "unsure";
  hasControl?: "yes" | "no" | "unsure";
  comparisons?: ComparisonSet | "unsure";
  assignment?: "randomized" | "convenience" | "observational" | "unsure";
}
export type DesignKey = keyof DesignAnswers;

export interface PowerPlan {
  effectF: number;
  targetPower: number;
  nPerGroup: number;
  achievedPower: number;
}

export interface Plan {
  policy: Policy;
  adjust: Adjustment;
  alpha: number;
  plannedTest: TestId;
  plannedPosthoc: string;
  comparisons: ComparisonSet;
  power: PowerPlan | null;
  lockedAt: string | null;
  lockedBy: Person | null;
}

export interface Study {
  id: number;
  title: string;
  objective: string;
  outcomeName: string;
  outcomeUnit: string;
  factorName: string;
  levels: string[];
  controlLevel: string | null;
  alpha: number;
  context: StudyContext;
  status: StudyStatus;
  owner: Person;
  createdAt: string;
  updatedAt: string;
  design: DesignAnswers;
  designComplete: boolean;
  /** Which answer still blocks the plan, in words, or null. */
  designBlocker?: string | null;
  outOfScope: string | null;
  plan: Plan;
  datasetCount: number;
  latestDataset: Dataset | null;
  latestAnalysisId: number | null;
}

// ---- Data ---------------------------------------------------------------------------------

export type Layout = "long" | "wide";

export interface ValidationReport {
  rowsRead: number;
  rowsUsed: number;
  excluded: {
    row: number;
    reason: "missing" | "non-numeric" | "missing-group" | "unknown-level" | string;
    value: string | number | null;
    column?: string;
  }[];
  /** All exclusions; the list above may be capped for very large files. */
  excludedCount?: number;
  /** Whether the data can be analysed (at least two groups of two values). */
  usable?: boolean;
  groupsFound: { name: string; n: number }[];
  unknownLevels: string[];
  missingLevels: string[];
  messages: string[];
}

export interface Dataset {
  id: number;
  version: number;
  fileName: string;
  sizeBytes: number;
  sha256: string;
  uploadedAt: string;
  uploadedBy: Person;
  groupColumn: string | null;
  outcomeColumn: string | null;
  layout: Layout;
  afterPlanLock: boolean;
  report: ValidationReport;
}

export interface DatasetPreview {
  columns: string[];
  rows: string[][];
  guess: { layout: Layout; groupColumn: string | null; outcomeColumn: string | null };
  rowCount: number;
}

// ---- Engine output (narrow) -----------------------------------------------------------------

export interface GroupDescription {
  name: string;
  n: number;
  missing?: number;
  mean: number;
  sd: Maybe<number>;
  se?: Maybe<number>;
  ciLower?: Maybe<number>;
  ciUpper?: Maybe<number>;
  median: number;
  q1?: number;
  q3?: number;
  iqr?: number;
  min: number;
  max: number;
  skewness?: Maybe<number>;
  kurtosis?: Maybe<number>;
  /** Raw values, when the server sends them (used for the points of the box plot). */
  values?: number[];
}

export interface AnovaPart {
  F: number;
  df1: number;
  df2: number;
  p: number;
  ssBetween?: number;
  ssWithin?: number;
  msBetween?: number;
  msWithin?: number;
  etaSquared?: number;
  omegaSquared?: number;
  cohensF?: number;
  etaSquaredCi?: Maybe<{ lower: number; upper: number; level?: number }>;
}
export interface WelchPart {
  F: number;
  df1: number;
  df2: number;
  p: number;
  omegaSquared?: number;
}
export interface KruskalPart {
  H: number;
  df: number;
  p: number;
  epsilonSquared?: number;
}
export interface FTestPart {
  F: number;
  df1: number;
  df2: number;
  p: number;
}
export interface BartlettPart {
  statistic: number;
  df: number;
  p: number;
}
export interface ShapiroPart {
  group?: string;
  n?: number;
  W: number;
  p: number;
}
export type ShapiroRow = ShapiroPart | (Unavailable & { group?: string; n?: number });

export interface FlaggedValue {
  value: number;
  row: number;
  studentizedResidual?: number;
}
export interface GroupOutliers {
  group: string;
  mild?: FlaggedValue[];
  mildCount?: number;
  extreme?: FlaggedValue[];
  extremeCount?: number;
  largeResidual?: FlaggedValue[];
  largeResidualCount?: number;
}
export interface OutlierPart {
  groups: GroupOutliers[];
  totalMild?: number;
  totalExtreme?: number;
  totalLargeResidual?: number;
}

export interface QqPart {
  theoretical: number[];
  residuals?: number[];
  sample?: number[];
  thinned?: boolean;
  n?: number;
}

export interface SdRatioDetail {
  ratio: number;
  largest?: { group: string; sd: number };
  smallest?: { group: string; sd: number };
}

export interface PairRow {
  a: string;
  b: string;
  diff?: number;
  lower?: Maybe<number>;
  upper?: Maybe<number>;
  df?: number;
  z?: number;
  p?: number;
  pAdj?: number;
  /** Effect size of the pair, when the engine gives one. */
  effectSize?: Maybe<{ name: string; value: number; lower?: number; upper?: number }>;
  d?: number;
  /** Engine: Hedges' g of the pair (pooled over the two groups, small-sample corrected). */
  hedgesG?: number | Maybe<{ available?: true; g: number; d?: number }>;
  /** Engine (Dunn): the rank-biserial correlation of the pair. */
  rankBiserial?: Maybe<{ available?: true; r: number }>;
  r?: number;
}

export interface PosthocPart {
  tukey?: Maybe<PairRow[]>;
  gamesHowell?: Maybe<PairRow[]>;
  dunn?: Maybe<PairRow[]>;
  /** Comparisons with the control, one family per omnibus test. */
  control?: Maybe<
    | PairRow[]
    | {
        control?: string;
        dunnett?: Maybe<PairRow[]>;
        welchHolm?: Maybe<PairRow[]>;
        dunn?: Maybe<PairRow[]>;
        comparisons?: PairRow[];
        rows?: PairRow[];
      }
  >;
  [method: string]: unknown;
}

export interface FamilyWisePart {
  m: number;
  fwerIndependent: number;
  bonferroniBound: number;
}

export interface Recommendation {
  test: TestId | "out-of-scope";
  posthoc: string;
  reasons: string[];
  caveats: string[];
  alternatives: { test: TestId; whyNot: string }[];
}

export interface AnalysisResult {
  options?: { alpha?: number; adjust?: Adjustment; control?: string; comparisons?: ComparisonSet };
  data?: { k: number; totalN: number; totalMissing?: number };
  groups: Maybe<GroupDescription[]>;
  anova: Maybe<AnovaPart>;
  welch: Maybe<WelchPart>;
  kruskalWallis: Maybe<KruskalPart>;
  levene: Maybe<FTestPart>;
  brownForsythe: Maybe<FTestPart>;
  bartlett: Maybe<BartlettPart>;
  shapiroWilk: Maybe<ShapiroRow[]>;
  shapiroWilkResiduals: Maybe<ShapiroPart>;
  sdRatio: Maybe<number | SdRatioDetail>;
  outliers: Maybe<OutlierPart>;
  qq: Maybe<QqPart>;
  posthoc: Maybe<PosthocPart>;
  familyWiseError: Maybe<FamilyWisePart>;
  recommendation: Maybe<Recommendation>;
  warnings?: string[];
}

export interface CheckReading {
  key: "normality" | "spread" | "outliers" | "sizes" | string;
  level: "ok" | "attention";
  text: string;
}

export interface ChecksResponse {
  datasetId: number;
  checks: AnalysisResult;
  readings: CheckReading[];
  /** The values read per group (decimal text or numbers), when the server sends them. */
  observations?: { groups: { name: string; values: (string | number)[]; rows?: number[] }[] };
}

export interface Analysis {
  id: number;
  studyId: number;
  datasetId: number;
  datasetVersion: number | null;
  engineVersion: string;
  createdAt: string;
  createdBy: Person | null;
  recommendedTest: TestId;
  chosenTest: TestId;
  posthocMethod: string;
  override: { justification: string } | null;
  result: AnalysisResult;
  summary: string[];
}

export interface PowerResult {
  k: number;
  effectF: number;
  alpha: number;
  nPerGroup: number;
  totalN: number;
  power: number;
  curve: { n: number; power: number }[];
}
