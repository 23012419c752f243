/**
 * The shapes the review screens read. Narrow on purpose: only the fields these screens use, so
 * the full study and analysis objects the API sends fit them as they are.
 */

export type StudyStatus = "draft" | "in_review" | "approved";
export type TestId = "anova" | "welch" | "kruskal-wallis";
export type ReviewStep = "design" | "plan" | "data" | "checks" | "choice" | "results";
export const REVIEW_STEPS: readonly ReviewStep[] = ["design", "plan", "data", "checks", "choice", "results"];

export interface Person {
  id: number;
  displayName: string;
}

export interface QueueItem {
  studyId: number;
  title: string;
  analyst: Person;
  submittedAt: string;
  round: number;
  recommendedTest: string;
  chosenTest: string;
  override: boolean;
  daysWaiting: number;
}

export interface ReviewComment {
  id?: number;
  step: ReviewStep | null;
  body: string;
  author: Person | null;
  createdAt: string;
}

export interface SignatureRecord {
  signerName: string;
  signedAt: string;
  meaning: string;
  contentHash: string;
}

export type Decision = "approved" | "changes_requested" | null;

export interface ReviewRound {
  id?: number;
  round: number;
  analysisId?: number;
  datasetId?: number;
  submittedAt: string;
  submittedBy: Person | null;
  decision: Decision;
  decidedAt: string | null;
  decidedBy: Person | null;
  comments: ReviewComment[];
  signature: SignatureRecord | null;
}

export interface TrailEvent {
  id: number;
  at: string;
  actorEmail: string | null;
  action: string;
  summary: string;
}

export interface StudyHistory {
  rounds: ReviewRound[];
  approvalValid: boolean;
  approvalNote: string | null;
  events: TrailEvent[];
}

/** The parts of a study the review page reads itself. */
export interface ReviewStudy {
  id: number;
  title: string;
  status: StudyStatus;
  owner: Person | null;
  outcomeName: string;
  factorName: string;
  levels: string[];
  plan: {
    policy: string;
    adjust: string;
    alpha: number;
    plannedTest: string;
    plannedPosthoc: string;
    lockedAt: string | null;
    lockedBy: Person | null;
    power: { effectF: number; targetPower: number; nPerGroup: number; achievedPower: number } | null;
  };
  latestDataset: {
    id: number;
    version: number;
    fileName: string;
    sha256: string;
    uploadedAt: string;
    afterPlanLock: boolean;
  } | null;
  latestAnalysisId: number | null;
}

/** The parts of a stored analysis the review page reads itself. */
export interface ReviewAnalysis {
  id: number;
  datasetId: number;
  datasetVersion: number | null;
  engineVersion: string;
  recommendedTest: string;
  chosenTest: string;
  posthocMethod: string;
  override: { justification: string } | null;
  createdAt: string;
  createdBy: Person | null;
}

export interface CheckReading {
  key: string;
  level: "ok" | "attention";
  text: string;
}
