import type { DataSource, EntityManager } from "typeorm";
import { Analysis } from "../analyses/analysis.entity.js";
import { Dataset } from "../datasets/dataset.entity.js";
import { ReviewComment } from "../reviews/review-comment.entity.js";
import { ReviewRound } from "../reviews/review-round.entity.js";
import { missingDesignAnswer, outOfScopeReason } from "./design.js";
import type { Study } from "./study.entity.js";
import { studyStatus, type StudyStatus, type StudyStatusRecords } from "./study-status.js";

/**
 * The active data version: the one chosen with "make active", else the newest upload.
 * Read inside a write transaction too, so submit and run see the same answer.
 */
export async function activeDataset(db: DataSource | EntityManager, study: Study): Promise<Dataset | null> {
  const repo = db.getRepository(Dataset);
  if (study.activeDatasetId !== null && study.activeDatasetId !== undefined) {
    const chosen = await repo.findOneBy({ id: study.activeDatasetId, studyId: study.id });
    if (chosen) return chosen;
  }
  return repo.findOne({ where: { studyId: study.id }, order: { version: "DESC" } });
}

/** Loads the records the status is computed from (a few indexed reads). */
export async function loadStatusRecords(
  db: DataSource | EntityManager,
  study: Study,
): Promise<StudyStatusRecords & { activeDatasetRow: Dataset | null }> {
  const active = await activeDataset(db, study);
  const analyses = db.getRepository(Analysis);
  const [onActive, latest, round] = await Promise.all([
    active
      ? analyses.findOne({
          where: { studyId: study.id, datasetId: active.id },
          order: { id: "DESC" },
          select: { id: true },
        })
      : null,
    analyses.findOne({
      where: { studyId: study.id },
      order: { id: "DESC" },
      select: { id: true, datasetId: true },
    }),
    db.getRepository(ReviewRound).findOne({ where: { studyId: study.id }, order: { round: "DESC" } }),
  ]);
  const versionOf = async (datasetId: number) =>
    (
      await db
        .getRepository(Dataset)
        .findOne({ where: { id: datasetId }, select: { id: true, version: true } })
    )?.version ?? 0;
  return {
    activeDatasetRow: active,
    status: study.status,
    outOfScope: outOfScopeReason(study.design),
    designComplete: missingDesignAnswer(study.design, !!study.controlLevel) === null,
    planLocked: !!study.planLockedAt,
    activeDataset: active ? { id: active.id, version: active.version } : null,
    analysisOnActive: onActive ? { id: onActive.id } : null,
    latestAnalysis: latest ? { id: latest.id, datasetVersion: await versionOf(latest.datasetId) } : null,
    lastRound: round
      ? {
          round: round.round,
          decision: round.decision,
          analysisId: round.analysisId,
          datasetVersion: await versionOf(round.datasetId),
          commentCount: await db.getRepository(ReviewComment).countBy({ roundId: round.id }),
        }
      : null,
  };
}

/** The study's one status, read from the database. */
export async function statusOf(db: DataSource | EntityManager, study: Study): Promise<StudyStatus> {
  return studyStatus(await loadStatusRecords(db, study));
}
