import { describe, expect, it } from "vitest";
import { currentStep, progressStep, studySteps } from "./step-status";
import { makeAnalysis, makeDataset, makeProgress, makeStudy } from "@/test/make-study";
import { engineResult } from "@/test/engine-fixtures";
import { formatDf, formatP, formatStat } from "@/lib/format";

const unequal = engineResult("unequal-spread");

const states = (s: ReturnType<typeof studySteps>) => Object.fromEntries(s.map((x) => [x.key, x.state]));
const facts = (s: ReturnType<typeof studySteps>) => Object.fromEntries(s.map((x) => [x.key, x.fact]));

const designed = {
  independence: "independent",
  scale: "continuous",
  question: "means",
  groupSizes: "equal",
  hasControl: "no",
  comparisons: "all-pairs",
  assignment: "randomized",
} as const;
const LOCKED = "2025-12-03T14:05:00.000Z";

// The server's status for each stage (apps/api/src/modules/studies/study-status.ts).
const planOpen = makeProgress({
  state: "plan-open",
  label: "Plan not locked",
  nextStep: { who: "analyst", where: "plan", action: "Lock the analysis plan" },
});
const awaitingData = makeProgress({
  state: "awaiting-data",
  label: "Waiting for data",
  nextStep: { who: "analyst", where: "data", action: "Upload the data" },
});
const awaitingAnalysis = makeProgress({
  state: "awaiting-analysis",
  label: "Data not yet analysed",
  nextStep: { who: "analyst", where: "choice", action: "Run the analysis on data version 1" },
});
const ready = makeProgress({
  state: "ready-to-submit",
  label: "Ready to submit",
  nextStep: { who: "analyst", where: "results", action: "Submit for review" },
});

describe("studySteps", () => {
  it("a new study: the design is open, everything after it locked", () => {
    const steps = studySteps(makeStudy());
    expect(states(steps)).toEqual({
      design: "open",
      plan: "locked",
      data: "locked",
      checks: "locked",
      choice: "locked",
      results: "locked",
    });
    expect(facts(steps).design).toBe("0 of 7 answered");
    expect(currentStep(steps)).toBe("design");
  });

  it("counts the answers given so far", () => {
    expect(
      facts(studySteps(makeStudy({ design: { independence: "independent", scale: "unsure" } }))).design,
    ).toBe("2 of 7 answered");
  });

  it("an out-of-scope design stays open, marked, and keeps the plan locked", () => {
    const steps = studySteps(
      makeStudy({ design: { independence: "paired" }, outOfScope: "paired measurements" }),
    );
    expect(steps[0]).toMatchObject({ state: "open", attention: true });
    expect(states(steps).plan).toBe("locked");
  });

  it("a complete design opens the plan; the data wait for the lock", () => {
    const steps = studySteps(makeStudy({ design: designed, designComplete: true, progress: planOpen }));
    expect(states(steps)).toMatchObject({ design: "done", plan: "open", data: "locked" });
    expect(facts(steps).plan).toBe("Classic one-way ANOVA planned, not locked");
    expect(currentStep(steps)).toBe("plan");
  });

  it("a locked plan shows when it was locked and opens the data", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      progress: awaitingData,
    });
    const steps = studySteps(study);
    expect(states(steps)).toMatchObject({ plan: "done", data: "open", checks: "locked" });
    expect(facts(steps).plan).toMatch(/^Plan locked 3 Dec 2025, \d\d:05$/);
    expect(currentStep(steps)).toBe("data");
  });

  it("uploaded data give n in k groups and open the checks and the choice", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      activeDataset: makeDataset(),
      datasetCount: 1,
      progress: awaitingAnalysis,
    });
    const steps = studySteps(study);
    expect(states(steps)).toMatchObject({ data: "done", checks: "open", choice: "open", results: "locked" });
    expect(facts(steps).data).toBe("n = 30 in 3 groups (v1, active)");
    expect(currentStep(steps)).toBe("choice");
  });

  it("an analysis completes the path; the results carry the omnibus line", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      activeDataset: makeDataset(),
      latestAnalysisId: 5,
      progress: ready,
    });
    const analysis = makeAnalysis({
      chosenTest: "welch",
      plannedTest: "welch",
      // analyze() on seeded data whose spreads differ about fourfold (src/test/engine-fixtures.ts).
      result: unequal,
    });
    const steps = studySteps(study, analysis);
    expect(states(steps)).toMatchObject({ checks: "done", choice: "done", results: "done" });
    expect(facts(steps).choice).toBe("Welch's ANOVA, as planned");
    if (!unequal.welch.available) throw new Error("Welch's ANOVA expected");
    const w = unequal.welch;
    expect(facts(steps).results).toBe(
      `F(${formatDf(w.df1)}, ${formatDf(w.df2)}) = ${formatStat(w.F)}, p ${formatP(w.p)} (data v1)`,
    );
    expect(currentStep(steps)).toBe("results");
  });

  it("a deviation from the plan is marked for the reviewer", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      latestAnalysisId: 5,
      progress: ready,
    });
    const steps = studySteps(
      study,
      makeAnalysis({
        chosenTest: "kruskal-wallis",
        deviation: { justification: "Ratings were recorded on a coarse scale." },
      }),
    );
    expect(steps[4]).toMatchObject({
      state: "done",
      attention: true,
      fact: "Kruskal–Wallis test, a deviation from the plan, shown to the reviewer",
    });
  });

  it("when the server says the active version is not analysed, the choice reopens on that version", () => {
    const v2 = makeDataset({ id: 12, version: 2 });
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: v2,
      activeDataset: v2,
      latestAnalysisId: 5,
      progress: { ...awaitingAnalysis, detail: "Data version 2 is not analysed yet." },
    });
    const steps = studySteps(study, makeAnalysis({ datasetId: 11 }));
    expect(steps[4]).toMatchObject({
      state: "open",
      attention: true,
      next: true,
      fact: "Data version 2 not yet analysed",
    });
    expect(states(steps).checks).toBe("open");
  });

  it("an earlier version made active is the one the data step names", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset({ id: 12, version: 2 }),
      activeDataset: makeDataset(),
      latestAnalysisId: 5,
      progress: ready,
    });
    expect(facts(studySteps(study, makeAnalysis())).data).toBe("n = 30 in 3 groups (v1, active)");
  });

  it("after changes were requested, continue leads where the server says", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      activeDataset: makeDataset(),
      latestAnalysisId: 5,
      progress: makeProgress({
        state: "changes-requested",
        label: "Changes requested",
        nextStep: {
          who: "analyst",
          where: "choice",
          action: "Run the analysis on data version 1, then submit again",
        },
      }),
    });
    const steps = studySteps(study, makeAnalysis());
    expect(currentStep(steps)).toBe("choice");
    expect(states(steps).choice).toBe("open");
  });

  it("a study in review marks no step as the analyst's next", () => {
    const study = makeStudy({
      status: "in_review",
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      latestAnalysisId: 5,
      progress: makeProgress({
        state: "in-review",
        label: "Awaiting review",
        nextStep: { who: "reviewer", where: "review", action: "Review: approve or request changes" },
      }),
    });
    expect(studySteps(study, makeAnalysis()).some((s) => s.next)).toBe(false);
  });

  it("never puts a missing number into a fact", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      latestAnalysisId: 5,
      progress: ready,
    });
    const all = studySteps(study, makeAnalysis({ datasetVersion: null }))
      .map((s) => s.fact)
      .join(" ");
    expect(all).not.toMatch(/NaN|undefined|Infinity|null/);
  });
});

describe("progressStep", () => {
  it.each([
    ["design", "design"],
    ["choice", "choice"],
    ["review", "results"],
    ["report", "results"],
  ] as const)("the server's next step %s → the %s step", (where, step) =>
    expect(progressStep(makeProgress({ nextStep: { who: "analyst", where, action: "x" } }))).toBe(step),
  );
});
