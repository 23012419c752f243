import { describe, expect, it } from "vitest";
import { currentStep, shortReason, studySteps } from "./step-status";
import { makeAnalysis, makeDataset, makeStudy } from "@/test/make-study";
import { engineResult } from "@/test/engine-fixtures";
import { formatDf, formatP, formatStat } from "@/lib/format";

const unequal = engineResult("unequal-spread");

const states = (s: ReturnType<typeof studySteps>) => Object.fromEntries(s.map((x) => [x.key, x.state]));
const facts = (s: ReturnType<typeof studySteps>) => Object.fromEntries(s.map((x) => [x.key, x.fact]));

const designed = {
  independence: "independent",
  scale: "continuous",
  hasControl: "no",
  comparisons: "all-pairs",
  assignment: "randomized",
} as const;
const LOCKED = "2025-12-03T14:05:00.000Z";

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
    expect(facts(steps).design).toBe("0 of 5 answered");
    expect(currentStep(steps)).toBe("design");
  });

  it("counts the answers given so far", () => {
    expect(
      facts(studySteps(makeStudy({ design: { independence: "independent", scale: "unsure" } }))).design,
    ).toBe("2 of 5 answered");
  });

  it("an out-of-scope design stays open, marked, and keeps the plan locked", () => {
    const steps = studySteps(
      makeStudy({ design: { independence: "paired" }, outOfScope: "paired measurements" }),
    );
    expect(steps[0]).toMatchObject({ state: "open", attention: true });
    expect(states(steps).plan).toBe("locked");
  });

  it("a complete design opens the plan; the data wait for the lock", () => {
    const steps = studySteps(makeStudy({ design: designed, designComplete: true }));
    expect(states(steps)).toMatchObject({ design: "done", plan: "open", data: "locked" });
    expect(facts(steps).plan).toBe("Classic one-way ANOVA planned, not locked");
    expect(currentStep(steps)).toBe("plan");
  });

  it("a locked plan shows when it was locked and opens the data", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
    });
    const steps = studySteps(study);
    expect(states(steps)).toMatchObject({ plan: "done", data: "open", checks: "locked" });
    expect(facts(steps).plan).toMatch(/^Plan locked 3 Dec 2025, \d\d:05$/);
  });

  it("uploaded data give n in k groups and open the checks and the choice", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      datasetCount: 1,
    });
    const steps = studySteps(study);
    expect(states(steps)).toMatchObject({ data: "done", checks: "open", choice: "open", results: "locked" });
    expect(facts(steps).data).toBe("n = 30 in 3 groups (v1)");
  });

  it("an analysis completes the path; the results carry the omnibus line", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      latestAnalysisId: 5,
    });
    const analysis = makeAnalysis({
      chosenTest: "welch",
      recommendedTest: "welch",
      // analyze() on seeded data whose spreads differ about fourfold (src/test/engine-fixtures.ts).
      result: unequal,
    });
    const steps = studySteps(study, analysis);
    expect(states(steps)).toMatchObject({ checks: "done", choice: "done", results: "done" });
    expect(facts(steps).choice).toBe("Welch's ANOVA, reason: unequal spread");
    if (!unequal.welch.available) throw new Error("Welch's ANOVA expected");
    const w = unequal.welch;
    expect(facts(steps).results).toBe(
      `F(${formatDf(w.df1)}, ${formatDf(w.df2)}) = ${formatStat(w.F)}, p ${formatP(w.p)} (data v1)`,
    );
    expect(currentStep(steps)).toBe("results");
  });

  it("an override is marked for the reviewer", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      latestAnalysisId: 5,
    });
    const steps = studySteps(
      study,
      makeAnalysis({
        chosenTest: "kruskal-wallis",
        override: { justification: "Ratings were recorded on a coarse scale." },
      }),
    );
    expect(steps[4]).toMatchObject({
      state: "done",
      attention: true,
      fact: "Kruskal–Wallis test, override flagged for the reviewer",
    });
  });

  it("a newer data version than the analysis reopens the choice", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset({ id: 12, version: 2 }),
      latestAnalysisId: 5,
    });
    const steps = studySteps(study, makeAnalysis({ datasetId: 11 }));
    expect(steps[4]).toMatchObject({
      state: "open",
      attention: true,
      fact: "New data version 2 not yet analysed",
    });
    expect(states(steps).checks).toBe("open");
  });

  it("never puts a missing number into a fact", () => {
    const study = makeStudy({
      design: designed,
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: LOCKED },
      latestDataset: makeDataset(),
      latestAnalysisId: 5,
    });
    const all = studySteps(study, makeAnalysis({ datasetVersion: null }))
      .map((s) => s.fact)
      .join(" ");
    expect(all).not.toMatch(/NaN|undefined|Infinity|null/);
  });
});

describe("shortReason", () => {
  it.each([
    [{ test: "kruskal-wallis", reasons: ["The outcome is ordinal, so…"] }, "ordinal outcome"],
    [
      {
        test: "kruskal-wallis",
        reasons: ["2 values lie beyond 3 IQR from the quartiles (extreme outliers)…"],
      },
      "extreme outliers",
    ],
    [
      { test: "welch", reasons: ["Welch's ANOVA is the default under the welch-first policy…"] },
      "Welch-first policy",
    ],
    [{ test: "anova", reasons: ["Equal variances are plausible…"] }, "similar spread"],
  ] as const)("%j → %s", (rec, expected) => expect(shortReason(rec as never)).toBe(expected));
});
