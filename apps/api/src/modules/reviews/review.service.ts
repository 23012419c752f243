import type { DataSource, EntityManager } from "typeorm";
import { verifyPassword } from "../../auth/password.js";
import { reauth } from "../../auth/reauth-guard.js";
import type { Actor } from "../../http/actor.js";
import { ConflictError, ForbiddenError, HttpError } from "../../http/errors.js";
import { Analysis } from "../analyses/analysis.entity.js";
import { recordAudit } from "../audit/audit.service.js";
import { Dataset } from "../datasets/dataset.entity.js";
import { enqueueMail } from "../mail/outbox.js";
import {
  approvedMessage,
  changesRequestedMessage,
  reportReadyMessage,
  reviewRequestedMessage,
} from "../mail/messages.js";
import { loadReadableStudy } from "../studies/study.access.js";
import { Study } from "../studies/study.entity.js";
import { activeDataset, statusOf } from "../studies/study-status-records.js";
import { User } from "../users/user.entity.js";
import { approvalContent, contentHash } from "./approval-content.js";
import { ReviewComment, type ReviewStep } from "./review-comment.entity.js";
import { ReviewRound } from "./review-round.entity.js";
import { Signature } from "./signature.entity.js";
import { roundChanges, type RoundRecord } from "./round-changes.js";
import { roundRecords } from "./round-records.js";
import { inTransaction } from "../../db/in-transaction.js";
import { readAll } from "../../db/read-all.js";

const activeWithRole = (tx: EntityManager, roles: string[]) =>
  tx
    .getRepository(User)
    .createQueryBuilder("u")
    .where("u.role IN (:...roles) AND u.active = :active", { roles, active: true })
    .orderBy("u.id")
    .getMany();

/** The study's status once this transaction's writes are in, for the e-mails it sends. */
async function statusAfter(tx: EntityManager, studyId: number) {
  return statusOf(tx, await tx.getRepository(Study).findOneByOrFail({ id: studyId }));
}

async function openRound(tx: EntityManager, studyId: number): Promise<ReviewRound> {
  const round = await tx.getRepository(ReviewRound).findOne({ where: { studyId }, order: { round: "DESC" } });
  if (!round || round.decision) throw new ConflictError("The study has no open review round.");
  return round;
}

/**
 * Sends a study for review: needs a locked plan and an analysis of the active data version (the
 * one named, else the newest on that version); freezes that analysis and its dataset version in
 * a new review round, and tells the reviewers. Every check runs inside the write transaction,
 * so a run or upload that finishes first is seen and one that finishes later is refused.
 */
export async function submitForReview(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  analysisId: number | undefined,
  baseUrl: string,
) {
  await inTransaction(ds, async (tx) => {
    const study = await loadReadableStudy(tx, studyId, actor.user);
    if (study.ownerId !== actor.user.id)
      throw new ForbiddenError("Only the study's own analyst can submit it for review.");
    if (study.status !== "draft")
      throw new ConflictError(
        `The study is already ${study.status.replace("_", " ")}; it can be submitted only as a draft.`,
      );
    if (!study.planLockedAt)
      throw new ConflictError("Lock the analysis plan and run the analysis before submitting.");
    // Checked inside the write transaction: what is submitted is the active version's analysis.
    const active = await activeDataset(tx, study);
    if (!active)
      throw new ConflictError(
        "Run the analysis before submitting: no data have been uploaded yet, so upload them first.",
      );
    const analysis = analysisId
      ? await tx.getRepository(Analysis).findOneBy({ id: analysisId, studyId })
      : await tx
          .getRepository(Analysis)
          .findOne({ where: { studyId, datasetId: active.id }, order: { id: "DESC" } });
    if (!analysis)
      throw new HttpError(
        409,
        analysisId ? "analysis_not_found" : "active_version_not_analysed",
        analysisId
          ? `Study ${studyId} has no analysis ${analysisId}.`
          : `Data version ${active.version} is the active version and has no analysis yet. Run the analysis on version ${active.version}, then submit.`,
      );
    if (analysis.datasetId !== active.id) {
      const used = await tx.getRepository(Dataset).findOneByOrFail({ id: analysis.datasetId });
      throw new HttpError(
        409,
        "analysis_not_on_active_version",
        `Analysis ${analysis.id} used data version ${used.version}, but the active version is ${active.version}. Run the analysis on version ${active.version} and submit that, or make version ${used.version} active again first.`,
      );
    }
    const last = await tx
      .getRepository(ReviewRound)
      .findOne({ where: { studyId }, order: { round: "DESC" } });
    const round = await tx.getRepository(ReviewRound).save(
      tx.getRepository(ReviewRound).create({
        studyId,
        round: (last?.round ?? 0) + 1,
        analysisId: analysis.id,
        datasetId: analysis.datasetId,
        submittedById: actor.user.id,
      }),
    );
    await tx.getRepository(Study).update({ id: studyId }, { status: "in_review" });
    await recordAudit(tx, actor, {
      action: "study.submitted",
      studyId,
      summary: `Submitted for review (round ${round.round}, analysis ${analysis.id})`,
      before: { status: "draft" },
      after: { status: "in_review", analysisId: analysis.id, datasetId: analysis.datasetId },
    });
    const status = await statusAfter(tx, studyId);
    // From round 2 on, the reviewers hear what changed since the round they sent back.
    const changes = last
      ? roundChanges(...((await roundRecords(tx, [last, round])) as [RoundRecord, RoundRecord]))
      : null;
    for (const r of await activeWithRole(tx, ["reviewer"]))
      await enqueueMail(tx, reviewRequestedMessage(r, study, actor.user, baseUrl, status, changes?.summary));
  });
}

/** Separation of duties: nobody approves or sends back a study they created, analysed or submitted. */
function requireIndependentReviewer(
  actor: Actor,
  study: Study,
  analysis: Analysis,
  round: ReviewRound,
): void {
  const u = actor.user.id;
  if (study.ownerId === u)
    throw new ForbiddenError(
      "You created this study, so someone else must review it (separation of duties).",
    );
  if (analysis.createdById === u || round.submittedById === u)
    throw new ForbiddenError(
      "You ran or submitted this analysis, so someone else must review it (separation of duties).",
    );
}

async function loadForDecision(tx: EntityManager, actor: Actor, studyId: number) {
  const study = await loadReadableStudy(tx, studyId, actor.user);
  if (study.status !== "in_review")
    throw new ConflictError(
      `The study is ${study.status.replace("_", " ")}; only a study in review can be decided.`,
    );
  const round = await openRound(tx, studyId);
  const analysis = await tx.getRepository(Analysis).findOneByOrFail({ id: round.analysisId });
  requireIndependentReviewer(actor, study, analysis, round);
  return { study, round, analysis };
}

/**
 * Approves with an electronic signature: the reviewer re-enters their password and states the
 * signature's meaning; the record keeps signer, time, meaning and a hash of what was approved.
 */
export async function approve(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  input: { password: string; meaning: string },
  baseUrl: string,
) {
  const hashRow = await ds
    .getRepository(User)
    .createQueryBuilder("u")
    .addSelect("u.passwordHash")
    .where("u.id = :id", { id: actor.user.id })
    .getOneOrFail();
  // Checked before the transaction: bcrypt is slow and must not hold the write lock.
  await reauth.check(ds, actor, "an approval signature");
  const passwordOk = await verifyPassword(input.password, hashRow.passwordHash);
  if (passwordOk) await reauth.succeeded(ds, actor);
  else await reauth.failed(ds, actor, "an approval signature", studyId);
  await inTransaction(ds, async (tx) => {
    const { study, round, analysis } = await loadForDecision(tx, actor, studyId);
    if (!passwordOk)
      throw new HttpError(
        403,
        "signature_rejected",
        "The password is not correct, so the approval was not signed.",
      );
    const dataset = await tx.getRepository(Dataset).findOneByOrFail({ id: analysis.datasetId });
    const hash = contentHash(approvalContent(study, analysis, dataset.sha256));
    await tx.getRepository(Signature).insert({
      studyId,
      roundId: round.id,
      signerId: actor.user.id,
      signerName: actor.user.displayName,
      signerEmail: actor.user.email,
      meaning: input.meaning,
      contentHash: hash,
    });
    await tx
      .getRepository(ReviewRound)
      .update({ id: round.id }, { decision: "approved", decidedById: actor.user.id, decidedAt: new Date() });
    await tx.getRepository(Study).update({ id: studyId }, { status: "approved" });
    await recordAudit(tx, actor, {
      action: "study.approved",
      studyId,
      summary: `Approved round ${round.round} with the signature "${input.meaning}"`,
      before: { status: "in_review" },
      after: { status: "approved", contentHash: hash, analysisId: analysis.id },
    });
    const owner = await tx.getRepository(User).findOneByOrFail({ id: study.ownerId });
    const status = await statusAfter(tx, studyId);
    await enqueueMail(tx, approvedMessage(owner, study, actor.user, baseUrl, status));
    for (const w of await activeWithRole(tx, ["writer"]))
      await enqueueMail(tx, reportReadyMessage(w, study, baseUrl, status));
  });
}

/** Sends the study back to its analyst with a required comment; the round is kept. */
export async function requestChanges(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  input: { comment: string; step?: ReviewStep | null; stepComments?: { step: ReviewStep; body: string }[] },
  baseUrl: string,
) {
  await inTransaction(ds, async (tx) => {
    const { study, round } = await loadForDecision(tx, actor, studyId);
    const comments = tx.getRepository(ReviewComment);
    await comments.insert({
      roundId: round.id,
      step: input.step ?? null,
      body: input.comment,
      authorId: actor.user.id,
    });
    for (const c of input.stepComments ?? [])
      await comments.insert({ roundId: round.id, step: c.step, body: c.body, authorId: actor.user.id });
    await tx
      .getRepository(ReviewRound)
      .update(
        { id: round.id },
        { decision: "changes_requested", decidedById: actor.user.id, decidedAt: new Date() },
      );
    await tx.getRepository(Study).update({ id: studyId }, { status: "draft" });
    await recordAudit(tx, actor, {
      action: "study.changes-requested",
      studyId,
      summary: `Requested changes in round ${round.round}`,
      before: { status: "in_review" },
      after: { status: "draft", comment: input.comment },
    });
    const owner = await tx.getRepository(User).findOneByOrFail({ id: study.ownerId });
    const status = await statusAfter(tx, studyId);
    await enqueueMail(tx, changesRequestedMessage(owner, study, actor.user, input.comment, baseUrl, status));
  });
}

/**
 * Whether a study's approval still covers exactly what is stored: recomputes the hash of the
 * approved content and compares it with the signature's.
 */
export async function verifyApproval(
  db: DataSource | EntityManager,
  studyId: number,
): Promise<{ valid: true; signature: Signature; analysis: Analysis } | { valid: false; reason: string }> {
  const signature = await db.getRepository(Signature).findOne({ where: { studyId }, order: { id: "DESC" } });
  if (!signature) return { valid: false, reason: "The study has not been approved." };
  const round = await db.getRepository(ReviewRound).findOneByOrFail({ id: signature.roundId });
  const [study, analysis] = await readAll(
    db,
    () => db.getRepository(Study).findOneByOrFail({ id: studyId }),
    () => db.getRepository(Analysis).findOneByOrFail({ id: round.analysisId }),
  );
  if (study.status !== "approved")
    return { valid: false, reason: `The study is ${study.status.replace("_", " ")}, not approved.` };
  const dataset = await db.getRepository(Dataset).findOneByOrFail({ id: analysis.datasetId });
  const hash = contentHash(approvalContent(study, analysis, dataset.sha256));
  if (hash !== signature.contentHash)
    return {
      valid: false,
      reason: "What was approved has changed since it was signed, so the approval no longer holds.",
    };
  return { valid: true, signature, analysis };
}
