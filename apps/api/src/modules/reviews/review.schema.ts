import { z } from "zod";
import { REVIEW_STEPS } from "./review-comment.entity.js";

export const submitSchema = z.object({ analysisId: z.number().int().positive().optional() }).strict();

export const approveSchema = z.object({
  password: z.string().min(1, "Re-enter your password to sign"),
  meaning: z
    .string()
    .trim()
    .min(5, "State what your signature means, e.g. approved as the analysis of record")
    .max(300),
});

export const requestChangesSchema = z.object({
  comment: z.string().trim().min(1, "Say what needs to change").max(4000),
  step: z.enum(REVIEW_STEPS).nullable().optional(),
  stepComments: z
    .array(z.object({ step: z.enum(REVIEW_STEPS), body: z.string().trim().min(1).max(4000) }))
    .max(20)
    .optional(),
});
