import { describe, expect, it } from "vitest";
import type { Study } from "./study.entity.js";
import { presentStudy } from "./study.presenter.js";
import { studyStatus } from "./study-status.js";

const study = (comparisons: "vs-control" | "all-pairs") =>
  ({
    id: 1,
    levels: ["Control", "B", "C", "D"],
    controlLevel: "Control",
    design: {
      independence: "independent",
      scale: "continuous",
      hasControl: "yes",
      comparisons,
      assignment: "randomized",
    },
    plan: { policy: "welch-first", adjust: "holm", alpha: 0.05, power: null },
    planLockedAt: null,
  }) as unknown as Study;

const extras = {
  datasetCount: 0,
  latestDataset: null,
  latestAnalysisId: null,
  activeDataset: null,
  progress: studyStatus({
    status: "draft",
    outOfScope: null,
    designComplete: true,
    planLocked: false,
    activeDataset: null,
    analysisOnActive: null,
    latestAnalysis: null,
    lastRound: null,
  }),
};

describe("the plan step's family-wise error counts the planned comparisons", () => {
  it('"each group against the control", k = 4 → m = 3, 1 − 0.95³ = .142625 (arithmetic)', () => {
    const fw = presentStudy(study("vs-control"), extras).plan.familyWise!;
    expect(fw.m).toBe(3);
    expect(fw.fwerIndependent).toBeCloseTo(0.142625, 15);
  });
  it("all pairs, k = 4 → m = 6, 1 − 0.95⁶ = .264908109375 (arithmetic)", () => {
    expect(presentStudy(study("all-pairs"), extras).plan.familyWise!.fwerIndependent).toBeCloseTo(
      0.264908109375,
      15,
    );
  });
});
