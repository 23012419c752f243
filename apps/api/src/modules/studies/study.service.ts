import { planPower, testName } from "@waymark/stats";
import type { DataSource } from "typeorm";
import type { z } from "zod";
import type { Actor } from "../../http/actor.js";
import { ConflictError, HttpError } from "../../http/errors.js";
import { Analysis } from "../analyses/analysis.entity.js";
import { recordAudit } from "../audit/audit.service.js";
import { Dataset } from "../datasets/dataset.entity.js";
import { missingDesignAnswer, outOfScopeReason, type DesignAnswers } from "./design.js";
import { DEFAULT_PLAN, testPlanOf, type PlanSettings } from "./plan.js";
import { loadEditableStudy, requireUnlockedPlan } from "./study.access.js";
import { Study } from "./study.entity.js";
import { presentStudy } from "./study.presenter.js";
import { loadStudyViews } from "./study-list-records.js";
import { loadStatusRecords, openReviewComments } from "./study-status-records.js";
import { studyStatus } from "./study-status.js";
import type { createStudySchema, planSchema, updateStudySchema } from "./study.schema.js";
import { inTransaction } from "../../db/in-transaction.js";

const QUESTION_LABELS: Record<string, string> = {
  independence: "independent groups",
  scale: "outcome scale",
  question: "question asked of the outcome",
  groupSizes: "planned group sizes",
  hasControl: "control group",
  comparisons: "planned comparisons",
  assignment: "how units were assigned",
};

export async function studyDto(ds: DataSource, study: Study) {
  const datasets = ds.getRepository(Dataset);
  const [datasetCount, latestDataset, latestAnalysis, records] = await Promise.all([
    datasets.countBy({ studyId: study.id }),
    datasets.findOne({ where: { studyId: study.id }, order: { version: "DESC" } }),
    ds
      .getRepository(Analysis)
      .findOne({ where: { studyId: study.id }, order: { id: "DESC" }, select: { id: true } }),
    loadStatusRecords(ds, study),
  ]);
  return presentStudy(study, {
    datasetCount,
    latestDataset,
    latestAnalysisId: latestAnalysis?.id ?? null,
    activeDataset: records.activeDatasetRow,
    progress: studyStatus(records),
    openReview: await openReviewComments(ds, study.id),
  });
}

/**
 * Many studies as `studyDto` gives each, from a fixed number of queries (study-list-records.ts)
 * and the same status function and presenter.
 */
export async function studyDtos(ds: DataSource, studies: Study[]) {
  const views = await loadStudyViews(ds, studies);
  return studies.map((study) => {
    const v = views.get(study.id)!;
    return presentStudy(study, {
      datasetCount: v.datasetCount,
      latestDataset: v.latestDataset,
      latestAnalysisId: v.latestAnalysisId,
      activeDataset: v.activeDataset,
      progress: studyStatus(v.status),
      openReview: v.openReview,
    });
  });
}

/** Re-reads a study with its relations after a write. */
const reload = (ds: DataSource, id: number) => ds.getRepository(Study).findOneByOrFail({ id });

export async function createStudy(
  ds: DataSource,
  actor: Actor,
  input: z.infer<typeof createStudySchema>,
  defaults: Partial<PlanSettings> = {},
): Promise<Study> {
  const plan: PlanSettings = {
    ...DEFAULT_PLAN,
    ...defaults,
    ...(input.alpha !== undefined ? { alpha: input.alpha } : {}),
  };
  const id = await inTransaction(ds, async (tx) => {
    const repo = tx.getRepository(Study);
    const saved = await repo.save(
      repo.create({
        ...input,
        controlLevel: input.controlLevel ?? null,
        alpha: plan.alpha,
        status: "draft",
        ownerId: actor.user.id,
        design: {},
        plan,
        planLockedAt: null,
        planLockedById: null,
      }),
    );
    await recordAudit(tx, actor, {
      action: "study.created",
      studyId: saved.id,
      summary: `Created study "${saved.title}"`,
      after: { levels: saved.levels, alpha: saved.alpha },
    });
    return saved.id;
  });
  return reload(ds, id);
}

export async function updateStudy(
  ds: DataSource,
  actor: Actor,
  id: number,
  input: z.infer<typeof updateStudySchema>,
): Promise<Study> {
  await inTransaction(ds, async (tx) => {
    const study = await loadEditableStudy(tx, id, actor.user);
    const touchesPlan =
      input.levels !== undefined || input.alpha !== undefined || input.controlLevel !== undefined;
    if (touchesPlan) requireUnlockedPlan(study);
    const levels = input.levels ?? study.levels;
    const control = input.controlLevel === undefined ? study.controlLevel : input.controlLevel;
    if (control && !levels.includes(control))
      throw new HttpError(400, "validation_failed", "controlLevel: The control must be one of the levels");
    const before = Object.fromEntries(Object.keys(input).map((k) => [k, study[k as keyof Study]]));
    Object.assign(study, input, { controlLevel: control ?? null });
    if (input.alpha !== undefined) study.plan = { ...study.plan, alpha: input.alpha };
    await tx.getRepository(Study).save(study);
    await recordAudit(tx, actor, {
      action: "study.updated",
      studyId: id,
      summary: `Edited ${Object.keys(input).join(", ")}`,
      before,
      after: input,
    });
  });
  return reload(ds, id);
}

export async function saveDesign(
  ds: DataSource,
  actor: Actor,
  id: number,
  answers: DesignAnswers,
): Promise<Study> {
  await inTransaction(ds, async (tx) => {
    const study = await loadEditableStudy(tx, id, actor.user);
    requireUnlockedPlan(study);
    const before = study.design;
    study.design = { ...study.design, ...answers };
    await tx.getRepository(Study).save(study);
    await recordAudit(tx, actor, {
      action: "study.design-saved",
      studyId: id,
      summary: `Answered: ${Object.keys(answers)
        .map((k) => QUESTION_LABELS[k] ?? k)
        .join(", ")}`,
      before,
      after: study.design,
    });
  });
  return reload(ds, id);
}

export async function savePlan(
  ds: DataSource,
  actor: Actor,
  id: number,
  input: z.infer<typeof planSchema>,
): Promise<Study> {
  await inTransaction(ds, async (tx) => {
    const study = await loadEditableStudy(tx, id, actor.user);
    requireUnlockedPlan(study);
    const before = study.plan;
    const next: PlanSettings = { ...study.plan, ...input, power: study.plan.power };
    if (input.power === null) next.power = null;
    else if (input.power) {
      // Power follows the primary test the design leads to (simulated for Kruskal–Wallis).
      const primary = testPlanOf(next, study.design);
      const size = planPower({
        test: primary.test === "out-of-scope" ? "anova" : primary.test,
        k: study.levels.length,
        f: input.power.effectF,
        alpha: next.alpha,
        power: input.power.targetPower,
      });
      next.power = {
        effectF: input.power.effectF,
        targetPower: input.power.targetPower,
        nPerGroup: size.nPerGroup,
        achievedPower: size.achievedPower,
        method: size.method,
        note: size.note,
      };
    }
    study.plan = next;
    study.alpha = next.alpha;
    await tx.getRepository(Study).save(study);
    await recordAudit(tx, actor, {
      action: "study.plan-saved",
      studyId: id,
      summary: "Saved the analysis plan",
      before,
      after: next,
    });
  });
  return reload(ds, id);
}

/** Freezes the plan with a timestamp so reviewers can see it came before the data. */
export async function lockPlan(ds: DataSource, actor: Actor, id: number): Promise<Study> {
  await inTransaction(ds, async (tx) => {
    const study = await loadEditableStudy(tx, id, actor.user);
    if (study.planLockedAt)
      throw new ConflictError(`The plan is already locked (since ${study.planLockedAt.toISOString()}).`);
    const outOfScope = outOfScopeReason(study.design);
    if (outOfScope) throw new HttpError(422, "out_of_scope", outOfScope);
    const missing = missingDesignAnswer(study.design, !!study.controlLevel);
    if (missing) throw new HttpError(422, "design_incomplete", `The plan cannot be locked yet: ${missing}`);
    const testPlan = testPlanOf(study.plan, study.design);
    if (testPlan.test === "out-of-scope") throw new HttpError(422, "out_of_scope", testPlan.reasons[0]!.text);
    // The primary test is decided now, before any data, and stored with the locked plan.
    study.plan = { ...study.plan, testPlan };
    study.planLockedAt = new Date();
    study.planLockedById = actor.user.id;
    await tx.getRepository(Study).save(study);
    await recordAudit(tx, actor, {
      action: "study.plan-locked",
      studyId: id,
      summary: `Locked the analysis plan; primary test: ${testName(testPlan.test)}`,
      after: { ...study.plan, design: study.design },
    });
  });
  return reload(ds, id);
}
