import { z } from "zod";
import { controlCharacterIn } from "../../text/printable.js";

/** Names and units are printed in figures, the DOCX and e-mail: control characters are refused. */
const printableName = (label: string, max: number) =>
  z
    .string()
    .trim()
    .max(max, `${label} must be at most ${max} characters`)
    .superRefine((s, ctx) => {
      const c = controlCharacterIn(s);
      if (c)
        ctx.addIssue({ code: "custom", message: `${label} contains the control character ${c}; remove it` });
    });

const text = (label: string, max: number) =>
  printableName(label, max).refine((s) => s.length >= 1, `${label} is required`);

const levels = z
  .array(printableName("A level name", 120).refine((s) => s.length >= 1, "A level name cannot be empty"))
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
  outcomeUnit: printableName("Unit", 40),
  factorName: text("Grouping factor", 120),
  levels,
  controlLevel: printableName("The control level", 120)
    .refine((s) => s.length >= 1)
    .nullable()
    .optional(),
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
