import { familyWiseError } from "@waymark/stats";
import type { Dataset } from "../datasets/dataset.entity.js";
import { presentDataset } from "../datasets/dataset.presenter.js";
import { missingDesignAnswer, outOfScopeReason } from "./design.js";
import { comparisonsOf, testPlanOf } from "./plan.js";
import type { Study } from "./study.entity.js";
import type { StudyStatus } from "./study-status.js";
import type { OpenReview } from "./study-status-records.js";

function plannedFamilyWise(k: number, alpha: number, comparisons: "all-pairs" | "vs-control") {
  if (k < 2) return null;
  const f = familyWiseError({ k, alpha, comparisons });
  return {
    m: f.m,
    comparisons,
    alpha: f.alpha,
    fwerIndependent: f.fwerIndependent,
    bonferroniAlpha: f.perComparisonAlphaBonferroni,
  };
}

const person = (u: { id: number; displayName: string } | null | undefined) =>
  u ? { id: u.id, displayName: u.displayName } : null;

/** The study as the API sends it, with what the web app needs to draw the trail of steps. */
export function presentStudy(
  s: Study,
  extras: {
    datasetCount: number;
    latestDataset: Dataset | null;
    latestAnalysisId: number | null;
    activeDataset: Dataset | null;
    progress: StudyStatus;
    openReview?: OpenReview;
  },
) {
  const testPlan = testPlanOf(s.plan, s.design);
  const comparisons = comparisonsOf(s.design);
  const planView = {
    // Locked: the decision stored at lock time; before that, what the current answers lead to.
    testPlan,
    plannedTest: testPlan.test,
    plannedPosthoc: testPlan.posthoc,
    comparisons,
    /** the family-wise error of the comparisons this plan makes (k − 1 against a control, else all pairs) */
    familyWise: plannedFamilyWise(s.levels.length, s.plan.alpha, comparisons),
    lockedAt: s.planLockedAt,
    lockedBy: person(s.planLockedBy),
  };
  return {
    id: s.id,
    title: s.title,
    objective: s.objective,
    outcomeName: s.outcomeName,
    outcomeUnit: s.outcomeUnit,
    factorName: s.factorName,
    levels: s.levels,
    controlLevel: s.controlLevel,
    alpha: s.alpha,
    context: s.context,
    status: s.status,
    owner: person(s.owner),
    createdAt: s.createdAt,
    updatedAt: s.updatedAt,
    design: s.design,
    designComplete: missingDesignAnswer(s.design, !!s.controlLevel) === null && !outOfScopeReason(s.design),
    designBlocker: missingDesignAnswer(s.design, !!s.controlLevel),
    outOfScope: outOfScopeReason(s.design),
    // Object.assign rather than a spread: spreading the stored plan and then adding keys takes a
    // slow path in V8 that was most of this function's time on a 50-study list.
    plan: Object.assign({}, s.plan, planView) as Omit<typeof s.plan, keyof typeof planView> & typeof planView,
    datasetCount: extras.datasetCount,
    latestDataset: extras.latestDataset ? presentDataset(extras.latestDataset, s) : null,
    latestAnalysisId: extras.latestAnalysisId,
    /** the version analyses and submissions use (chosen with "make active", else the newest) */
    activeDataset: extras.activeDataset ? presentDataset(extras.activeDataset, s) : null,
    /** the one status every page, list, queue and e-mail shows (study-status.ts) */
    progress: extras.progress,
    /** after "request changes": that round's comments (each with its step) and the analyst's replies */
    openReview: extras.openReview ?? null,
  };
}

export type StudyDto = ReturnType<typeof presentStudy>;
