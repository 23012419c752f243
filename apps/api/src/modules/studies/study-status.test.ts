import { describe, expect, it } from "vitest";
import { studyStatus, type StudyStatusRecords } from "./study-status.js";

// Property tests of the one status function: each record set gives one state and one next
// step, and the states found wanting in the field (stale analysis, changes requested) say so.
const base: StudyStatusRecords = {
  status: "draft",
  outOfScope: null,
  designComplete: true,
  planLocked: true,
  activeDataset: { id: 2, version: 2 },
  analysisOnActive: { id: 5 },
  latestAnalysis: { id: 5, datasetVersion: 2 },
  lastRound: null,
};
const s = (over: Partial<StudyStatusRecords>) => studyStatus({ ...base, ...over });

describe("study status", () => {
  it("walks a draft through its steps, one next step each", () => {
    expect(s({ designComplete: false }).state).toBe("design-open");
    expect(s({ planLocked: false }).nextStep).toMatchObject({ who: "analyst", where: "plan" });
    expect(s({ activeDataset: null, analysisOnActive: null, latestAnalysis: null }).state).toBe(
      "awaiting-data",
    );
    expect(s({}).state).toBe("ready-to-submit");
    expect(s({}).nextStep.action).toBe("Submit for review");
    expect(s({ outOfScope: "Paired designs are out of scope." }).detail).toBe(
      "Paired designs are out of scope.",
    );
  });

  it("a new data version not yet analysed is never 'done'", () => {
    const r = s({ analysisOnActive: null, latestAnalysis: { id: 4, datasetVersion: 1 } });
    expect(r.state).toBe("awaiting-analysis");
    expect(r.detail).toBe("Data version 2 is not analysed yet; the latest analysis used version 1.");
    expect(r.nextStep.action).toBe("Run the analysis on data version 2");
  });

  it("after 'request changes' the draft says so, with the work still to do", () => {
    const round = {
      round: 1,
      decision: "changes_requested" as const,
      analysisId: 4,
      datasetVersion: 1,
      commentCount: 2,
    };
    const r = s({ lastRound: round });
    expect(r).toMatchObject({ state: "changes-requested", label: "Changes requested" });
    expect(r.detail).toMatch(/^The reviewer sent round 1 back with 2 comments\./);
    const stale = s({ lastRound: round, analysisOnActive: null });
    expect(stale.state).toBe("changes-requested");
    expect(stale.nextStep.action).toBe("Run the analysis on data version 2, then submit again");
    expect(s({ lastRound: { ...round, commentCount: 1 } }).detail).toMatch(/with 1 comment\./);
  });

  it("in review is the reviewer's move; approved is the writer's", () => {
    const round = { round: 2, decision: null, analysisId: 5, datasetVersion: 2, commentCount: 0 };
    expect(s({ status: "in_review", lastRound: round }).nextStep.who).toBe("reviewer");
    const done = s({ status: "approved", lastRound: { ...round, decision: "approved" } });
    expect(done).toMatchObject({ state: "approved", nextStep: { who: "writer", where: "report" } });
    expect(done.detail).toBe("Approved in round 2 (analysis 5 on data version 2); the report is ready.");
  });
});
