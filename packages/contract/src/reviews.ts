import { z } from "zod";
import { person, timestamp } from "./common.js";
import { omnibusTest, reviewDecision, reviewStep } from "./enums.js";
import { LIMITS } from "./limits.js";

export const submitBody = z.object({ analysisId: z.number().int().positive().optional() }).strict();

export const approveBody = z.object({
  password: z.string().min(1, "Re-enter your password to sign"),
  meaning: z
    .string()
    .trim()
    .min(
      LIMITS.minSignatureMeaning,
      "State what your signature means, e.g. approved as the analysis of record",
    )
    .max(LIMITS.maxSignatureMeaning),
});
export type ApproveBody = z.infer<typeof approveBody>;

export const requestChangesBody = z.object({
  comment: z.string().trim().min(1, "Say what needs to change").max(LIMITS.comment),
  step: reviewStep.nullable().optional(),
  stepComments: z
    .array(z.object({ step: reviewStep, body: z.string().trim().min(1).max(LIMITS.comment) }))
    .max(LIMITS.maxStepComments)
    .optional(),
});
export type RequestChangesBody = z.infer<typeof requestChangesBody>;

export const queueItem = z.object({
  studyId: z.number(),
  title: z.string(),
  analyst: person,
  submittedAt: timestamp,
  round: z.number(),
  recommendedTest: omnibusTest,
  chosenTest: omnibusTest,
  override: z.boolean(),
  daysWaiting: z.number(),
});
export type QueueItem = z.infer<typeof queueItem>;
export const reviewQueueResponse = z.object({ queue: z.array(queueItem) });

/** The analyst's answer to a reviewer's comment. */
export const replyBody = z.object({ body: z.string().trim().min(1, "Write the reply").max(LIMITS.comment) });
export type ReplyBody = z.infer<typeof replyBody>;

export const reviewReply = z.object({
  id: z.number(),
  body: z.string(),
  author: person,
  createdAt: timestamp,
});
export type ReviewReply = z.infer<typeof reviewReply>;
export const replyResponse = z.object({ reply: reviewReply.extend({ commentId: z.number() }) });

export const reviewComment = z.object({
  id: z.number(),
  step: reviewStep.nullable(),
  body: z.string(),
  author: person.nullable(),
  createdAt: timestamp,
  replies: z.array(reviewReply).default([]),
});
export type ReviewComment = z.infer<typeof reviewComment>;

export const signatureRecord = z.object({
  signerName: z.string(),
  signedAt: timestamp,
  meaning: z.string(),
  contentHash: z.string(),
});
export type SignatureRecord = z.infer<typeof signatureRecord>;

const changed = <T extends z.ZodTypeAny>(t: T) => z.object({ before: t, after: t, changed: z.boolean() });
/** From round 2 on: what changed since the round before (reviews/round-changes.ts). */
export const roundChanges = z.object({
  sinceRound: z.number(),
  dataVersion: changed(z.number()),
  test: changed(z.string()),
  posthoc: changed(z.string()),
  deviation: changed(z.string().nullable()),
  keyNumbers: z.array(
    z.object({ name: z.string(), before: z.string().nullable(), after: z.string().nullable() }),
  ),
  summary: z.array(z.string()),
});
export type RoundChanges = z.infer<typeof roundChanges>;

export const reviewRound = z.object({
  id: z.number(),
  round: z.number(),
  analysisId: z.number(),
  datasetId: z.number(),
  submittedAt: timestamp,
  submittedBy: person.nullable(),
  decision: reviewDecision.nullable(),
  decidedAt: timestamp.nullable(),
  decidedBy: person.nullable(),
  comments: z.array(reviewComment),
  changes: roundChanges.nullable().default(null),
  signature: signatureRecord.nullable(),
});
export type ReviewRound = z.infer<typeof reviewRound>;

export const trailEvent = z.object({
  id: z.number(),
  at: timestamp,
  actorEmail: z.string().nullable(),
  action: z.string(),
  summary: z.string(),
});
export type TrailEvent = z.infer<typeof trailEvent>;

export const studyHistory = z.object({
  rounds: z.array(reviewRound),
  approvalValid: z.boolean(),
  approvalNote: z.string().nullable(),
  events: z.array(trailEvent),
});
export type StudyHistory = z.infer<typeof studyHistory>;
