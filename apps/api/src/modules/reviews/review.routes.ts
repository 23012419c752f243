import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import type { Env } from "../../config/env.js";
import { actorOf } from "../../http/actor.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { Analysis } from "../analyses/analysis.entity.js";
import { AuditEvent } from "../audit/audit-event.entity.js";
import { loadReadableStudy } from "../studies/study.access.js";
import { Study } from "../studies/study.entity.js";
import { studyDto } from "../studies/study.service.js";
import { statusOf } from "../studies/study-status-records.js";
import { ReviewComment } from "./review-comment.entity.js";
import { ReviewRound } from "./review-round.entity.js";
import { approveSchema, requestChangesSchema, submitSchema } from "./review.schema.js";
import { approve, requestChanges, submitForReview, verifyApproval } from "./review.service.js";
import { Signature } from "./signature.entity.js";
import { ReviewReply } from "./review-reply.entity.js";
import { replySchema, replyToComment } from "./comment-replies.js";
import { roundChanges } from "./round-changes.js";
import { roundRecords } from "./round-records.js";

const REVIEWERS = policy.roles("reviewer", "admin");
const DAY_MS = 86_400_000;

export function studyReviewRoutes(ds: DataSource, env: Env): RouteSpec[] {
  const reply = async (id: number, res: import("express").Response) =>
    res.json({ study: await studyDto(ds, await ds.getRepository(Study).findOneByOrFail({ id })) });
  return [
    {
      method: "post",
      path: "/:id/submit",
      policy: policy.roles("analyst"),
      summary: "Submit a study for review (freezes its analysis and dataset version)",
      handlers: [
        async (req, res) => {
          const id = Number(req.params.id);
          await submitForReview(
            ds,
            actorOf(req),
            id,
            parseBody(submitSchema, req.body).analysisId,
            env.publicUrl,
          );
          await reply(id, res);
        },
      ],
    },
    {
      method: "post",
      path: "/:id/approve",
      policy: REVIEWERS,
      summary: "Approve with an electronic signature (password and meaning)",
      handlers: [
        async (req, res) => {
          const id = Number(req.params.id);
          await approve(ds, actorOf(req), id, parseBody(approveSchema, req.body), env.publicUrl);
          await reply(id, res);
        },
      ],
    },
    {
      method: "post",
      path: "/:id/request-changes",
      policy: REVIEWERS,
      summary: "Send a study back to its analyst with comments",
      handlers: [
        async (req, res) => {
          const id = Number(req.params.id);
          await requestChanges(
            ds,
            actorOf(req),
            id,
            parseBody(requestChangesSchema, req.body),
            env.publicUrl,
          );
          await reply(id, res);
        },
      ],
    },
    {
      method: "post",
      path: "/:id/comments/:commentId/replies",
      policy: policy.roles("analyst"),
      summary: "Reply to a reviewer's comment (the study's analyst, after changes were requested)",
      handlers: [
        async (req, res) => {
          const reply = await replyToComment(
            ds,
            actorOf(req),
            Number(req.params.id),
            Number(req.params.commentId),
            parseBody(replySchema, req.body).body,
          );
          res.status(201).json({
            reply: {
              id: reply.id,
              commentId: reply.commentId,
              body: reply.body,
              author: { id: reply.author.id, displayName: reply.author.displayName },
              createdAt: reply.createdAt,
            },
          });
        },
      ],
    },
    {
      method: "get",
      path: "/:id/history",
      policy: policy.roles("analyst", "reviewer", "writer", "admin"),
      summary: "Review rounds, comments, signatures and the study's audit events",
      handlers: [
        async (req, res) => {
          const study = await loadReadableStudy(ds, Number(req.params.id), req.user!);
          const rounds = await ds
            .getRepository(ReviewRound)
            .find({ where: { studyId: study.id }, order: { round: "ASC" } });
          const comments = rounds.length
            ? await ds
                .getRepository(ReviewComment)
                .createQueryBuilder("c")
                .leftJoinAndSelect("c.author", "a")
                .where("c.round_id IN (:...ids)", { ids: rounds.map((r) => r.id) })
                .orderBy("c.id")
                .getMany()
            : [];
          const replies = comments.length
            ? await ds
                .getRepository(ReviewReply)
                .createQueryBuilder("r")
                .leftJoinAndSelect("r.author", "a")
                .where("r.comment_id IN (:...ids)", { ids: comments.map((c) => c.id) })
                .orderBy("r.id")
                .getMany()
            : [];
          const records = await roundRecords(ds, rounds);
          const signatures = await ds
            .getRepository(Signature)
            .find({ where: { studyId: study.id }, order: { id: "ASC" } });
          const events = await ds
            .getRepository(AuditEvent)
            .find({ where: { studyId: study.id }, order: { id: "ASC" } });
          const approval = await verifyApproval(ds, study.id);
          res.json({
            progress: await statusOf(ds, study),
            rounds: rounds.map((r, i) => ({
              id: r.id,
              round: r.round,
              analysisId: r.analysisId,
              datasetId: r.datasetId,
              submittedAt: r.submittedAt,
              submittedBy: { id: r.submittedBy.id, displayName: r.submittedBy.displayName },
              decision: r.decision,
              decidedAt: r.decidedAt,
              decidedBy: r.decidedBy ? { id: r.decidedBy.id, displayName: r.decidedBy.displayName } : null,
              comments: comments
                .filter((c) => c.roundId === r.id)
                .map((c) => ({
                  id: c.id,
                  step: c.step,
                  body: c.body,
                  author: { id: c.author.id, displayName: c.author.displayName },
                  createdAt: c.createdAt,
                  replies: replies
                    .filter((x) => x.commentId === c.id)
                    .map((x) => ({
                      id: x.id,
                      body: x.body,
                      author: { id: x.author.id, displayName: x.author.displayName },
                      createdAt: x.createdAt,
                    })),
                })),
              // From round 2 on: what changed since the round before (data, test, deviation, key numbers).
              changes: i > 0 ? roundChanges(records[i - 1]!, records[i]!) : null,
              signature:
                signatures
                  .filter((s) => s.roundId === r.id)
                  .map((s) => ({
                    signerName: s.signerName,
                    signedAt: s.signedAt,
                    meaning: s.meaning,
                    contentHash: s.contentHash,
                  }))[0] ?? null,
            })),
            approvalValid: approval.valid,
            approvalNote: approval.valid ? null : approval.reason,
            events: events.map((e) => ({
              id: e.id,
              at: e.at,
              actorEmail: e.actorEmail,
              action: e.action,
              summary: e.summary,
            })),
          });
        },
      ],
    },
  ];
}

export function reviewQueueRoutes(ds: DataSource): RouteSpec[] {
  return [
    {
      method: "get",
      path: "/queue",
      policy: REVIEWERS,
      summary: "Studies waiting for review",
      handlers: [
        async (_req, res) => {
          const studies = await ds
            .getRepository(Study)
            .find({ where: { status: "in_review" }, order: { id: "ASC" } });
          const items = await Promise.all(
            studies.map(async (s) => {
              const round = await ds
                .getRepository(ReviewRound)
                .findOneOrFail({ where: { studyId: s.id }, order: { round: "DESC" } });
              const analysis = await ds.getRepository(Analysis).findOneOrFail({
                where: { id: round.analysisId },
                select: { id: true, recommendedTest: true, chosenTest: true, overrideJustification: true },
              });
              return {
                studyId: s.id,
                title: s.title,
                analyst: { id: s.owner.id, displayName: s.owner.displayName },
                submittedAt: round.submittedAt,
                round: round.round,
                recommendedTest: analysis.recommendedTest,
                chosenTest: analysis.chosenTest,
                override: !!analysis.overrideJustification,
                daysWaiting: Math.floor((Date.now() - new Date(round.submittedAt).getTime()) / DAY_MS),
                progress: await statusOf(ds, s),
              };
            }),
          );
          items.sort((a, b) => new Date(a.submittedAt).getTime() - new Date(b.submittedAt).getTime());
          res.json({ queue: items });
        },
      ],
    },
  ];
}
