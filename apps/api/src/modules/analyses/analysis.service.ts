import { checkReadings, ENGINE_VERSION, posthocFamilyFor, resultSummary, testName } from "@waymark/stats";
import type { AnalysisResult } from "@waymark/stats";
import type { DataSource, EntityManager } from "typeorm";
import type { Actor } from "../../http/actor.js";
import { HttpError, NotFoundError } from "../../http/errors.js";
import { runTask } from "../../workers/task-pool.js";
import { recordAudit } from "../audit/audit.service.js";
import { Dataset } from "../datasets/dataset.entity.js";
import { loadDatasetForAnalysis } from "../datasets/dataset.service.js";
import type { OmnibusTest } from "../studies/plan.js";
import { loadEditableStudy, loadReadableStudy } from "../studies/study.access.js";
import type { Study } from "../studies/study.entity.js";
import { Analysis } from "./analysis.entity.js";
import { analysisOptions } from "./analysis-options.js";
import { MIN_JUSTIFICATION } from "./analysis.schema.js";
import { inTransaction } from "../../db/in-transaction.js";

/** Runs the engine on a stored dataset under the study's plan, off the request thread. */
export async function runEngine(study: Study, dataset: Dataset) {
  const { result } = await runTask("analyzeTask", {
    groups: dataset.observations.groups.map((g) => ({ name: g.name, values: g.values, rows: g.rows })),
    options: analysisOptions(study),
  });
  return { result };
}

/** Checks and recommendation for a dataset under the study's plan; computed, not stored. */
/** Up to this many values the checks also send the raw values, so plots can draw every point. */
export const CHECKS_MAX_POINTS = 5000;

export async function runChecks(study: Study, dataset: Dataset) {
  const { result } = await runEngine(study, dataset);
  const total = dataset.observations.groups.reduce((s, g) => s + g.values.length, 0);
  const observations =
    total <= CHECKS_MAX_POINTS
      ? {
          groups: dataset.observations.groups.map((g) => ({
            name: g.name,
            values: g.values.map(Number),
            rows: g.rows,
          })),
        }
      : null;
  return { checks: result, readings: checkReadings(result), observations };
}

/** The engine call a run makes; tests of run failures pass their own. */
export type AnalysisEngine = (study: Study, dataset: Dataset) => Promise<{ result: AnalysisResult }>;

export interface RunInput {
  datasetId: number;
  test?: OmnibusTest;
  justification?: string;
}

/**
 * What a run request must pass before a run is recorded: the caller's own draft study, its plan
 * locked, the dataset one of its versions. Cheap reads; the engine has not run yet.
 */
export async function checkRunRequest(
  ds: DataSource,
  user: Express.User,
  studyId: number,
  datasetId: number,
): Promise<Study> {
  const study = await loadEditableStudy(ds, studyId, user);
  if (!study.planLockedAt)
    throw new HttpError(409, "plan_not_locked", "Lock the analysis plan before running the analysis.");
  const found = await ds.getRepository(Dataset).exists({ where: { id: datasetId, studyId: study.id } });
  if (!found) throw new HttpError(404, "not_found", `Study ${study.id} has no dataset ${datasetId}.`);
  return study;
}

/** An analysis computed under the plan's rules, ready to be stored. */
export interface ComputedAnalysis {
  study: Study;
  dataset: Dataset;
  result: AnalysisResult;
  planned: OmnibusTest;
  chosen: OmnibusTest;
  justification: string | null;
}

/**
 * Runs the locked plan on one dataset version. The plan's primary test is the test of record;
 * running another is a deviation from the plan that needs a written justification, stored and
 * shown to the reviewer. A test that cannot be computed never runs. Stores nothing.
 */
export async function computeAnalysis(
  ds: DataSource,
  user: Express.User,
  studyId: number,
  input: RunInput,
  engine: AnalysisEngine = runEngine,
): Promise<ComputedAnalysis> {
  const study = await checkRunRequest(ds, user, studyId, input.datasetId);
  const dataset = await loadDatasetForAnalysis(ds, study.id, input.datasetId);
  const { result } = await engine(study, dataset);
  const decision = result.recommendation;
  if (decision.test === "out-of-scope")
    throw new HttpError(
      422,
      "out_of_scope",
      decision.reasons[0]?.text ?? "This design is outside what Waymark analyses.",
    );
  const planned = decision.test;
  const chosen = input.test ?? planned;
  const isDeviation = chosen !== planned;
  if (!isDeviation && !decision.computable) {
    throw new HttpError(
      422,
      "planned_test_unavailable",
      decision.reasons.find((r) => r.code === "decision.not-computable")?.text ??
        `${testName(planned)} cannot be computed on these data.`,
    );
  }
  const part = chosen === "anova" ? result.anova : chosen === "welch" ? result.welch : result.kruskalWallis;
  if ("available" in part && part.available === false && "reason" in part) {
    throw new HttpError(
      422,
      "test_unavailable",
      `${testName(chosen)} cannot be computed on these data: ${String(part.reason)}.`,
    );
  }
  if (isDeviation && (input.justification ?? "").length < MIN_JUSTIFICATION) {
    throw new HttpError(
      400,
      "justification_required",
      `Running ${testName(chosen)} instead of the plan's primary test, ${testName(planned)}, is a deviation from the locked plan and needs a written justification of at least ${MIN_JUSTIFICATION} characters; the reviewer will see it.`,
    );
  }
  return {
    study,
    dataset,
    result,
    planned,
    chosen,
    justification: isDeviation ? input.justification!.trim() : null,
  };
}

/**
 * Writes a computed analysis and its audit events through the caller's transaction, so they
 * commit or roll back with whatever else the caller writes. Returns the analysis id.
 */
export async function storeAnalysis(tx: EntityManager, actor: Actor, c: ComputedAnalysis): Promise<number> {
  const { study, dataset, result, planned, chosen } = c;
  // Checked again inside the write: a submit or approval that landed while the engine ran wins.
  await loadEditableStudy(tx, study.id, actor.user);
  const repo = tx.getRepository(Analysis);
  const saved = await repo.save(
    repo.create({
      studyId: study.id,
      datasetId: dataset.id,
      engineVersion: ENGINE_VERSION,
      // The column keeps its first name; it holds the test of record under the locked plan.
      recommendedTest: planned,
      chosenTest: chosen,
      posthocMethod: posthocFamilyFor(chosen, result.options.comparisons),
      overrideJustification: c.justification,
      planSnapshot: {
        ...study.plan,
        lockedAt: study.planLockedAt,
        design: study.design,
        levels: study.levels,
        controlLevel: study.controlLevel,
      },
      result,
      summary: resultSummary(result, chosen, study.outcomeName),
      createdById: actor.user.id,
    }),
  );
  await recordAudit(tx, actor, {
    action: "analysis.run",
    studyId: study.id,
    summary: `Ran ${testName(chosen)} on dataset version ${dataset.version}`,
    after: {
      analysisId: saved.id,
      datasetId: dataset.id,
      chosenTest: chosen,
      plannedTest: planned,
      engineVersion: ENGINE_VERSION,
    },
  });
  if (c.justification !== null) {
    await recordAudit(tx, actor, {
      action: "analysis.override",
      studyId: study.id,
      summary: `Deviated from the plan: ran ${testName(chosen)} instead of the primary test, ${testName(planned)}`,
      after: { analysisId: saved.id, justification: saved.overrideJustification },
    });
  }
  return saved.id;
}

/**
 * Computes and stores an analysis in this process, without a run row: for seeding demo data.
 * Requests go through the analysis runs (`runs/analysis-runner.ts`), which survive an instance.
 */
export async function runAnalysis(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  input: RunInput,
): Promise<Analysis> {
  const computed = await computeAnalysis(ds, actor.user, studyId, input);
  const id = await inTransaction(ds, (tx) => storeAnalysis(tx, actor, computed));
  return ds.getRepository(Analysis).findOneByOrFail({ id });
}

export async function loadAnalysis(
  ds: DataSource,
  user: Express.User,
  studyId: number,
  analysisId: number,
): Promise<Analysis> {
  const study = await loadReadableStudy(ds, studyId, user);
  const a = await ds.getRepository(Analysis).findOneBy({ id: analysisId, studyId: study.id });
  if (!a) throw new NotFoundError(`Study ${studyId} has no analysis ${analysisId}.`);
  return a;
}

export function presentAnalysis(a: Analysis, datasetVersion?: number) {
  return {
    id: a.id,
    studyId: a.studyId,
    datasetId: a.datasetId,
    datasetVersion: datasetVersion ?? null,
    engineVersion: a.engineVersion,
    createdAt: a.createdAt,
    createdBy: a.createdBy ? { id: a.createdBy.id, displayName: a.createdBy.displayName } : null,
    plannedTest: a.recommendedTest,
    chosenTest: a.chosenTest,
    posthocMethod: a.posthocMethod,
    deviation: a.overrideJustification ? { justification: a.overrideJustification } : null,
    planSnapshot: a.planSnapshot,
    result: a.result,
    summary: a.summary,
  };
}
