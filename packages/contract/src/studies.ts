import { z } from "zod";
import { POWER_METHODS } from "@waymark/stats/vocabulary";
import { alpha, codedText, person, printableText, text, timestamp } from "./common.js";
import {
  adjustment,
  comparisons,
  DESIGN_ANSWERS,
  omnibusTest,
  policy,
  posthocFamily,
  studyContext,
  studyStatus,
} from "./enums.js";
import { LIMITS } from "./limits.js";
import { datasetDto } from "./datasets.js";
import { reviewReply } from "./reviews.js";

const levels = z
  .array(
    printableText("A level name", LIMITS.levelName).refine(
      (s) => s.length >= 1,
      "A level name cannot be empty",
    ),
  )
  .min(LIMITS.minLevels, "List at least two levels of the grouping factor")
  .max(LIMITS.maxLevels, `Waymark compares at most ${LIMITS.maxLevels} groups`)
  .refine((l) => new Set(l).size === l.length, "Level names must be different from each other");

/** The study's details, as a person types them. */
export const studyFields = {
  title: text("Title", LIMITS.title),
  objective: text("Objective", LIMITS.objective, { allowBreaks: true }),
  outcomeName: text("Outcome name", LIMITS.outcomeName),
  outcomeUnit: printableText("Unit", LIMITS.outcomeUnit),
  factorName: text("Grouping factor", LIMITS.factorName),
  levels,
  controlLevel: printableText("The control level", LIMITS.levelName)
    .refine((s) => s.length >= 1, "The control level cannot be empty")
    .nullable()
    .optional(),
  alpha: alpha.optional(),
  context: studyContext,
};

const controlInLevels = (s: { levels?: string[]; controlLevel?: string | null }) =>
  !s.controlLevel || !s.levels || s.levels.includes(s.controlLevel);
const controlMessage = { message: "The control must be one of the levels", path: ["controlLevel"] };

export const createStudyBody = z.object(studyFields).refine(controlInLevels, controlMessage);
export type CreateStudyBody = z.infer<typeof createStudyBody>;

export const updateStudyBody = z.object(studyFields).partial().refine(controlInLevels, controlMessage);
export type UpdateStudyBody = z.infer<typeof updateStudyBody>;

export const designAnswers = z
  .object({
    independence: z.enum(DESIGN_ANSWERS.independence),
    scale: z.enum(DESIGN_ANSWERS.scale),
    question: z.enum(DESIGN_ANSWERS.question),
    groupSizes: z.enum(DESIGN_ANSWERS.groupSizes),
    hasControl: z.enum(DESIGN_ANSWERS.hasControl),
    comparisons: z.enum(DESIGN_ANSWERS.comparisons),
    assignment: z.enum(DESIGN_ANSWERS.assignment),
  })
  .partial();
export type DesignAnswers = z.infer<typeof designAnswers>;
export const designBody = designAnswers.strict();

export const powerPlanInput = z.object({
  effectF: z.number().gt(0, "Cohen's f must be above 0").max(LIMITS.maxEffectF),
  targetPower: z
    .number()
    .min(LIMITS.minTargetPower, "Target power below .50 is not a usual plan")
    .max(LIMITS.maxTargetPower),
});

export const planBody = z
  .object({ policy, adjust: adjustment, alpha, power: powerPlanInput.nullable() })
  .partial()
  .strict();
export type PlanBody = z.infer<typeof planBody>;

export const powerPlan = powerPlanInput.extend({
  nPerGroup: z.number(),
  achievedPower: z.number(),
  /** How the primary test's power was computed; older plans have none (noncentral F). */
  method: z.enum(POWER_METHODS).optional(),
  note: z.string().optional(),
});
export type PowerPlan = z.infer<typeof powerPlan>;

/** The primary test the plan decides from the design before any data (stored at lock time). */
export const testPlan = z.object({
  test: omnibusTest,
  posthoc: posthocFamily,
  rule: z
    .object({ to: z.literal("welch"), maxSdRatio: z.number(), maxSizeRatio: z.number(), text: z.string() })
    .nullable(),
  reasons: z.array(codedText),
});
export type TestPlanDto = z.infer<typeof testPlan>;

/** The stored plan: ids only. */
export const planSettings = z.object({
  policy,
  adjust: adjustment,
  alpha,
  power: powerPlan.nullable(),
  testPlan: testPlan.optional(),
});
export type PlanSettings = z.infer<typeof planSettings>;

const outOfScopePlan = z.object({
  test: z.literal("out-of-scope"),
  posthoc: z.literal("none"),
  rule: z.null(),
  reasons: z.array(codedText),
});

export const planDto = planSettings.extend({
  /** Locked: the decision stored at lock time; before that, what the current answers lead to. */
  testPlan: z.union([testPlan, outOfScopePlan]),
  plannedTest: z.union([omnibusTest, z.literal("out-of-scope")]),
  plannedPosthoc: z.union([posthocFamily, z.literal("none")]),
  /** The family-wise error of the comparisons this plan makes (k − 1 against a control, else all pairs). */
  familyWise: z
    .object({
      m: z.number(),
      comparisons,
      alpha: z.number(),
      fwerIndependent: z.number(),
      bonferroniAlpha: z.number(),
    })
    .nullable(),
  comparisons,
  lockedAt: timestamp.nullable(),
  lockedBy: person.nullable(),
});
export type PlanDto = z.infer<typeof planDto>;

export const STUDY_STATES = [
  "out-of-scope",
  "design-open",
  "plan-open",
  "awaiting-data",
  "awaiting-analysis",
  "ready-to-submit",
  "changes-requested",
  "in-review",
  "approved",
] as const;

/** A study's one status, computed on the server from its records (study-status.ts). */
export const studyProgress = z.object({
  state: z.enum(STUDY_STATES),
  label: z.string(),
  detail: z.string(),
  nextStep: z.object({
    who: z.enum(["analyst", "reviewer", "writer"]),
    where: z.enum(["design", "plan", "data", "choice", "results", "review", "report"]),
    action: z.string(),
  }),
});
export type StudyProgress = z.infer<typeof studyProgress>;

/** After "request changes": that round's comments, each at its step, with the analyst's replies. */
export const openReview = z.object({
  round: z.number(),
  decidedAt: timestamp.nullable(),
  decidedBy: person.nullable(),
  comments: z.array(
    z.object({
      id: z.number(),
      step: z.string().nullable(),
      body: z.string(),
      author: person,
      createdAt: timestamp,
      replies: z.array(reviewReply),
    }),
  ),
});
export type OpenReview = z.infer<typeof openReview>;

export const studyDto = z.object({
  id: z.number(),
  title: z.string(),
  objective: z.string(),
  outcomeName: z.string(),
  outcomeUnit: z.string(),
  factorName: z.string(),
  levels: z.array(z.string()),
  controlLevel: z.string().nullable(),
  alpha: z.number(),
  context: studyContext,
  status: studyStatus,
  owner: person.nullable(),
  createdAt: timestamp,
  updatedAt: timestamp,
  design: designAnswers,
  designComplete: z.boolean(),
  /** Which answer still blocks the plan, in words, or null. */
  designBlocker: z.string().nullable(),
  outOfScope: z.string().nullable(),
  plan: planDto,
  datasetCount: z.number(),
  latestDataset: datasetDto.nullable(),
  latestAnalysisId: z.number().nullable(),
  /** The version analyses and submissions use (chosen with "make active", else the newest). */
  activeDataset: datasetDto.nullable(),
  progress: studyProgress,
  openReview: openReview.nullable(),
});
export type StudyDto = z.infer<typeof studyDto>;

export const studyResponse = z.object({ study: studyDto });
export const studyListResponse = z.object({ studies: z.array(studyDto) });
