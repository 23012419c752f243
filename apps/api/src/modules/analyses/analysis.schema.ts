import { z } from "zod";

export const MIN_JUSTIFICATION = 20;

export const runAnalysisSchema = z.object({
  datasetId: z.number().int().positive("datasetId must be a dataset of this study"),
  test: z
    .enum(["anova", "welch", "kruskal-wallis"], "test must be anova, welch or kruskal-wallis")
    .optional(),
  justification: z.string().trim().max(4000).optional(),
});
