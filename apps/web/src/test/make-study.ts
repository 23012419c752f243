import type { Analysis, AnalysisResult, Dataset, Study } from "@/features/studies/types";

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
      plannedTest: "anova",
      plannedPosthoc: "Tukey–Kramer HSD",
      comparisons: "all-pairs",
      power: null,
      lockedAt: null,
      lockedBy: null,
    },
    datasetCount: 0,
    latestDataset: null,
    latestAnalysisId: null,
    ...over,
  };
}

export function makeDataset(over: Partial<Dataset> = {}): Dataset {
  return {
    id: 11,
    version: 1,
    fileName: "joints.csv",
    sizeBytes: 812,
    sha256: "3f7a1c9e5b2d4f6a8c0e1b3d5f7a9c2e4b6d8f0a1c3e5b7d9f2a4c6e8b0d1f3a",
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

const U = (reason: string) => ({ available: false as const, reason });

/** An engine result where nothing could be computed: every part is Unavailable. */
export function unavailableResult(): AnalysisResult {
  return {
    groups: U("no groups"),
    anova: U("All values are identical, so the F ratio cannot be formed"),
    welch: U("Welch's ANOVA weights each group by n/variance; group 'Epoxy' has zero variance"),
    kruskalWallis: U("all values are tied"),
    levene: U("zero spread"),
    brownForsythe: U("zero spread"),
    bartlett: U("zero variance"),
    shapiroWilk: U("too few values"),
    shapiroWilkResiduals: U("too few values"),
    sdRatio: U("Group 'Epoxy' has zero standard deviation, so the ratio of SDs cannot be formed"),
    outliers: U("zero spread"),
    qq: U("A Q–Q plot needs at least 2 residuals; found 0"),
    posthoc: U("post-hoc comparisons are not integrated yet"),
    familyWiseError: U("post-hoc comparisons are not integrated yet"),
    recommendation: U("no recommendation"),
  };
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
    recommendedTest: "anova",
    chosenTest: "anova",
    posthocMethod: "Tukey–Kramer HSD",
    override: null,
    result: unavailableResult(),
    summary: [],
    ...over,
  };
}
