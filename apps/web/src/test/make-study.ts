import type {
  AnalysisDto as Analysis,
  DatasetDto as Dataset,
  StudyDto as Study,
  StudyProgress,
} from "@waymark/contract";
import type { AnalysisResult } from "@waymark/stats/result";
import { engineResult } from "./engine-fixtures";

/** An invented study for tests: tensile strength of glued joints under three adhesives. */
export function makeStudy(over: Partial<Study> = {}): Study {
  return {
    id: 7,
    title: "Adhesive joints",
    objective: "Does the adhesive change the strength of lap joints?",
    outcomeName: "Shear strength",
    outcomeUnit: "MPa",
    factorName: "Adhesive",
    levels: ["Epoxy", "Acrylic", "Urethane"],
    controlLevel: null,
    alpha: 0.05,
    context: "general",
    status: "draft",
    owner: { id: 1, displayName: "Ada Okafor" },
    createdAt: "2025-12-03T09:00:00.000Z",
    updatedAt: "2025-12-03T09:00:00.000Z",
    design: {},
    designComplete: false,
    designBlocker: "Answer whether the groups are independent.",
    outOfScope: null,
    plan: {
      policy: "classic-first",
      adjust: "holm",
      alpha: 0.05,
      testPlan: { test: "anova", posthoc: "tukey-kramer", rule: null, reasons: [] },
      plannedTest: "anova",
      plannedPosthoc: "tukey-kramer",
      // Three groups, all pairs: m = 3, 1 − (1 − .05)³ = .142625 (common practice), .05 / 3 each.
      familyWise: {
        m: 3,
        comparisons: "all-pairs",
        alpha: 0.05,
        fwerIndependent: 0.142625,
        bonferroniAlpha: 0.05 / 3,
      },
      comparisons: "all-pairs",
      power: null,
      lockedAt: null,
      lockedBy: null,
    },
    datasetCount: 0,
    latestDataset: null,
    latestAnalysisId: null,
    activeDataset: over.latestDataset ?? null,
    progress: makeProgress(),
    openReview: null,
    ...over,
  };
}

/** The server's one status (apps/api/src/modules/studies/study-status.ts), here for a new study. */
export function makeProgress(over: Partial<StudyProgress> = {}): StudyProgress {
  return {
    state: "design-open",
    label: "Design questions open",
    detail: "Some design questions are not answered yet.",
    nextStep: { who: "analyst", where: "design", action: "Answer the design questions" },
    ...over,
  };
}

export function makeDataset(over: Partial<Dataset> = {}): Dataset {
  return {
    id: 11,
    studyId: 7,
    version: 1,
    fileName: "joints.csv",
    sizeBytes: 812,
    sha256: "3f7a1c9e5b2d4f6a8c0e1b3d5f7a9c2e4b6d8f0a1c3e5b7d9f2a4c6e8b0d1f3a",
    mediaType: "text/csv",
    uploadedAt: "2025-12-04T10:00:00.000Z",
    uploadedBy: { id: 1, displayName: "Ada Okafor" },
    groupColumn: "Adhesive",
    outcomeColumn: "Strength",
    layout: "long",
    afterPlanLock: true,
    report: {
      rowsRead: 30,
      rowsUsed: 30,
      excluded: [],
      excludedCount: 0,
      usable: true,
      groupsFound: [
        { name: "Epoxy", n: 10 },
        { name: "Acrylic", n: 10 },
        { name: "Urethane", n: 10 },
      ],
      unknownLevels: [],
      missingLevels: [],
      messages: [],
    },
    ...over,
  };
}

/** The engine's own result when nothing can be computed (every value identical): every test is Unavailable. */
export function unavailableResult(): AnalysisResult {
  return engineResult("identical");
}

export function makeAnalysis(over: Partial<Analysis> = {}): Analysis {
  return {
    id: 5,
    studyId: 7,
    datasetId: 11,
    datasetVersion: 1,
    engineVersion: "0.1.0",
    createdAt: "2025-12-04T11:00:00.000Z",
    createdBy: { id: 1, displayName: "Ada Okafor" },
    plannedTest: "anova",
    chosenTest: "anova",
    posthocMethod: "tukey-kramer",
    deviation: null,
    planSnapshot: {},
    result: engineResult("equal-spread"),
    summary: [],
    ...over,
  };
}
