import type { DataSource, EntityManager } from "typeorm";
import { readAll } from "../../db/read-all.js";
import { Analysis } from "../analyses/analysis.entity.js";
import { Dataset } from "../datasets/dataset.entity.js";
import { ReviewComment } from "../reviews/review-comment.entity.js";
import { ReviewRound } from "../reviews/review-round.entity.js";
import { ReviewReply } from "../reviews/review-reply.entity.js";
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
  const [onActive, latest, round] = await readAll(
    db,
    () =>
      active
        ? analyses.findOne({
            where: { studyId: study.id, datasetId: active.id },
            order: { id: "DESC" },
            select: { id: true },
          })
        : Promise.resolve(null),
    () =>
      analyses.findOne({
        where: { studyId: study.id },
        order: { id: "DESC" },
        select: { id: true, datasetId: true },
      }),
    () => db.getRepository(ReviewRound).findOne({ where: { studyId: study.id }, order: { round: "DESC" } }),
  );
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

/**
 * The comments of the round that sent the study back, with the analyst's replies, so each can
 * be shown at the step it concerns; null unless the latest round requested changes.
 */
export async function openReviewComments(db: DataSource | EntityManager, studyId: number) {
  const round = await db.getRepository(ReviewRound).findOne({ where: { studyId }, order: { round: "DESC" } });
  if (!round || round.decision !== "changes_requested") return null;
  const comments = await db
    .getRepository(ReviewComment)
    .find({ where: { roundId: round.id }, order: { id: "ASC" } });
  const replies = comments.length
    ? await db.getRepository(ReviewReply).find({
        where: comments.map((c) => ({ commentId: c.id })),
        order: { id: "ASC" },
      })
    : [];
  return presentOpenReview(round, comments, replies);
}

export type OpenReview = ReturnType<typeof presentOpenReview> | null;

/** The open round as the study page shows it: each comment with its replies, oldest first. */
export function presentOpenReview(round: ReviewRound, comments: ReviewComment[], replies: ReviewReply[]) {
  const person = (u: { id: number; displayName: string }) => ({ id: u.id, displayName: u.displayName });
  const repliesTo = new Map<number, ReviewReply[]>();
  for (const r of replies) {
    const list = repliesTo.get(r.commentId);
    if (list) list.push(r);
    else repliesTo.set(r.commentId, [r]);
  }
  return {
    round: round.round,
    decidedAt: round.decidedAt,
    decidedBy: round.decidedBy ? person(round.decidedBy) : null,
    comments: comments.map((c) => ({
      id: c.id,
      step: c.step,
      body: c.body,
      author: person(c.author),
      createdAt: c.createdAt,
      replies: (repliesTo.get(c.id) ?? []).map((r) => ({
        id: r.id,
        body: r.body,
        author: person(r.author),
        createdAt: r.createdAt,
      })),
    })),
  };
}
