import { z } from "zod";

const text = (label: string, max: number) =>
  z.string().trim().min(1, `${label} is required`).max(max, `${label} must be at most ${max} characters`);

const levels = z
  .array(z.string().trim().min(1, "A level name cannot be empty").max(120))
  .min(2, "List at least two levels of the grouping factor")
  .max(20, "Waymark compares at most 20 groups")
  .refine((l) => new Set(l).size === l.length, "Level names must be different from each other");

export const alphaSchema = z
  .number()
  .gt(0, "α must be above 0")
  .max(0.2, "α above .20 is not a usual significance level");

export const studyFields = {
  title: text("Title", 200),
  objective: text("Objective", 4000),
  outcomeName: text("Outcome name", 120),
  outcomeUnit: z.string().trim().max(40, "Unit must be at most 40 characters"),
  factorName: text("Grouping factor", 120),
  levels,
  controlLevel: z.string().trim().min(1).max(120).nullable().optional(),
  alpha: alphaSchema.optional(),
  context: z.enum(["general", "clinical", "safety-critical"], "Choose general, clinical or safety-critical"),
};

const controlInLevels = (s: { levels?: string[]; controlLevel?: string | null }) =>
  !s.controlLevel || !s.levels || s.levels.includes(s.controlLevel);

export const createStudySchema = z
  .object(studyFields)
  .refine(controlInLevels, { message: "The control must be one of the levels", path: ["controlLevel"] });

export const updateStudySchema = z
  .object(studyFields)
  .partial()
  .refine(controlInLevels, { message: "The control must be one of the levels", path: ["controlLevel"] });

const unsure = "unsure" as const;
export const designSchema = z
  .object({
    independence: z.enum(["independent", "paired", unsure]),
    scale: z.enum(["continuous", "ordinal", unsure]),
    question: z.enum(["means", "larger-values", unsure]),
    groupSizes: z.enum(["equal", "unequal", unsure]),
    hasControl: z.enum(["yes", "no", unsure]),
    comparisons: z.enum(["all-pairs", "vs-control", unsure]),
    assignment: z.enum(["randomized", "convenience", "observational", unsure]),
  })
  .partial()
  .strict();

export const planSchema = z
  .object({
    policy: z.enum(["classic-first", "welch-first"]),
    adjust: z.enum(["holm", "bonferroni", "bh"]),
    alpha: alphaSchema,
    power: z
      .object({
        effectF: z.number().gt(0, "Cohen's f must be above 0").max(5),
        targetPower: z.number().min(0.5, "Target power below .50 is not a usual plan").max(0.999),
      })
      .nullable(),
  })
  .partial()
  .strict();
