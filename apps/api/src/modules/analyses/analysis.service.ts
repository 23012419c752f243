import { checkReadings, ENGINE_VERSION, resultSummary, TEST_NAMES, type ResultView } from "@waymark/stats";
import type { DataSource } from "typeorm";
import type { Actor } from "../../http/actor.js";
import { HttpError, NotFoundError } from "../../http/errors.js";
import { runTask } from "../../workers/task-pool.js";
import { recordAudit } from "../audit/audit.service.js";
import type { Dataset } from "../datasets/dataset.entity.js";
import { loadDatasetForAnalysis } from "../datasets/dataset.service.js";
import { comparisonsOf, matchedPosthoc, type OmnibusTest } from "../studies/plan.js";
import { loadEditableStudy, loadReadableStudy } from "../studies/study.access.js";
import type { Study } from "../studies/study.entity.js";
import { Analysis } from "./analysis.entity.js";
import { analysisOptions } from "./analysis-options.js";
import { MIN_JUSTIFICATION } from "./analysis.schema.js";
import { inTransaction } from "../../db/in-transaction.js";
import { pauseAt } from "../../db/pause-points.js";

/** Runs the engine on a stored dataset under the study's plan, off the request thread. */
async function runEngine(study: Study, dataset: Dataset) {
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
  return { checks: result, readings: checkReadings(result as unknown as ResultView), observations };
}

/**
 * Runs the locked plan on one dataset version and stores the result. Choosing a test other than
 * the recommended one needs a written justification, stored and flagged for the reviewer.
 */
export async function runAnalysis(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  input: { datasetId: number; test?: OmnibusTest; justification?: string },
): Promise<Analysis> {
  const user = actor.user;
  const study = await loadEditableStudy(ds, studyId, user);
  if (!study.planLockedAt)
    throw new HttpError(409, "plan_not_locked", "Lock the analysis plan before running the analysis.");
  const dataset = await loadDatasetForAnalysis(ds, study.id, input.datasetId);
  const { result } = await runEngine(study, dataset);
  const recommended = result.recommendation.test;
  if (recommended === "out-of-scope")
    throw new HttpError(
      422,
      "out_of_scope",
      result.recommendation.reasons[0] ?? "This design is outside what Waymark analyses.",
    );
  const chosen = input.test ?? recommended;
  const isOverride = chosen !== recommended;
  if (isOverride && (input.justification ?? "").length < MIN_JUSTIFICATION) {
    throw new HttpError(
      400,
      "justification_required",
      `Choosing ${chosen} instead of the recommended ${recommended} needs a written justification of at least ${MIN_JUSTIFICATION} characters; the reviewer will see it.`,
    );
  }
  await pauseAt("analysis.before-store");
  const id = await inTransaction(ds, async (tx) => {
    // Checked again inside the write: a submit or approval that landed while the engine ran wins.
    await loadEditableStudy(tx, studyId, user);
    const repo = tx.getRepository(Analysis);
    const saved = await repo.save(
      repo.create({
        studyId: study.id,
        datasetId: dataset.id,
        engineVersion: ENGINE_VERSION,
        recommendedTest: recommended,
        chosenTest: chosen,
        posthocMethod: matchedPosthoc(chosen, comparisonsOf(study.design)),
        overrideJustification: isOverride ? input.justification!.trim() : null,
        planSnapshot: {
          ...study.plan,
          lockedAt: study.planLockedAt,
          design: study.design,
          levels: study.levels,
          controlLevel: study.controlLevel,
        },
        result,
        summary: resultSummary(result as unknown as ResultView, chosen, study.outcomeName),
        createdById: user.id,
      }),
    );
    await recordAudit(tx, actor, {
      action: "analysis.run",
      studyId: study.id,
      summary: `Ran ${TEST_NAMES[chosen] ?? chosen} on dataset version ${dataset.version}`,
      after: {
        analysisId: saved.id,
        datasetId: dataset.id,
        chosenTest: chosen,
        recommendedTest: recommended,
        engineVersion: ENGINE_VERSION,
      },
    });
    if (isOverride) {
      await recordAudit(tx, actor, {
        action: "analysis.override",
        studyId: study.id,
        summary: `Chose ${TEST_NAMES[chosen] ?? chosen} instead of the recommended ${TEST_NAMES[recommended] ?? recommended}`,
        after: { analysisId: saved.id, justification: saved.overrideJustification },
      });
    }
    return saved.id;
  });
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
    recommendedTest: a.recommendedTest,
    chosenTest: a.chosenTest,
    posthocMethod: a.posthocMethod,
    override: a.overrideJustification ? { justification: a.overrideJustification } : null,
    planSnapshot: a.planSnapshot,
    result: a.result,
    summary: a.summary,
  };
}
