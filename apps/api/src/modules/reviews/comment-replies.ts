import type { DataSource } from "typeorm";
import { z } from "zod";
import { inTransaction } from "../../db/in-transaction.js";
import type { Actor } from "../../http/actor.js";
import { ConflictError, NotFoundError } from "../../http/errors.js";
import { recordAudit } from "../audit/audit.service.js";
import { loadEditableStudy } from "../studies/study.access.js";
import { ReviewComment } from "./review-comment.entity.js";
import { ReviewReply } from "./review-reply.entity.js";
import { ReviewRound } from "./review-round.entity.js";

export const replySchema = z.object({ body: z.string().trim().min(1, "Write the reply").max(4000) }).strict();

/**
 * The analyst answers one comment of the round that sent the study back. Only the study's
 * analyst, only while the study is a draft after "request changes", checked inside the write.
 */
export async function replyToComment(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  commentId: number,
  body: string,
): Promise<ReviewReply> {
  return inTransaction(ds, async (tx) => {
    await loadEditableStudy(tx, studyId, actor.user);
    const comment = Number.isInteger(commentId)
      ? await tx.getRepository(ReviewComment).findOneBy({ id: commentId })
      : null;
    const round = comment ? await tx.getRepository(ReviewRound).findOneBy({ id: comment.roundId }) : null;
    if (!comment || !round || round.studyId !== studyId)
      throw new NotFoundError(`Study ${studyId} has no review comment ${commentId}.`);
    const latest = await tx
      .getRepository(ReviewRound)
      .findOne({ where: { studyId }, order: { round: "DESC" } });
    if (latest?.id !== round.id || round.decision !== "changes_requested")
      throw new ConflictError(
        `Comment ${commentId} belongs to round ${round.round}, which is closed; replies go to the comments of the round that sent the study back.`,
      );
    const repo = tx.getRepository(ReviewReply);
    const saved = await repo.save(repo.create({ commentId, body, authorId: actor.user.id }));
    await recordAudit(tx, actor, {
      action: "study.comment-answered",
      studyId,
      summary: `Replied to the reviewer's comment${comment.step ? ` on the ${comment.step} step` : ""} in round ${round.round}`,
      after: { commentId, replyId: saved.id },
    });
    return repo.findOneByOrFail({ id: saved.id });
  });
}
