import { z } from "zod";

export const powerSchema = z
  .object({
    k: z.number().int().min(2, "k must be at least 2 groups").max(50, "k must be at most 50"),
    effectF: z.number().gt(0, "Cohen's f must be above 0").max(5).optional(),
    means: z.array(z.number()).min(2).optional(),
    sd: z.number().gt(0, "The common SD must be above 0").optional(),
    alpha: z.number().gt(0).max(0.2).default(0.05),
    power: z.number().gt(0.05).lt(1).optional(),
    n: z.number().int().min(2, "n per group must be at least 2").max(100000).optional(),
  })
  .refine((b) => b.effectF !== undefined || (b.means !== undefined && b.sd !== undefined), {
    message: "Give Cohen's f, or the expected means with a common SD",
    path: ["effectF"],
  })
  .refine((b) => (b.power === undefined) !== (b.n === undefined), {
    message: "Give either a target power or n per group, not both",
    path: ["power"],
  })
  .refine((b) => !b.means || b.means.length === b.k, {
    message: "Give one expected mean per group",
    path: ["means"],
  });
