import { z } from "zod";
import { alpha } from "./common.js";
import { LIMITS } from "./limits.js";

export const powerBody = z
  .object({
    k: z
      .number()
      .int()
      .min(2, "k must be at least 2 groups")
      .max(LIMITS.maxPowerGroups, `k must be at most ${LIMITS.maxPowerGroups}`),
    effectF: z.number().gt(0, "Cohen's f must be above 0").max(LIMITS.maxEffectF).optional(),
    means: z.array(z.number()).min(2).optional(),
    sd: z.number().gt(0, "The common SD must be above 0").optional(),
    alpha: alpha.default(0.05),
    power: z.number().gt(0.05).lt(1).optional(),
    n: z.number().int().min(2, "n per group must be at least 2").max(LIMITS.maxPowerN).optional(),
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
export type PowerBody = z.input<typeof powerBody>;

export const powerResponse = z.object({
  k: z.number(),
  effectF: z.number(),
  alpha: z.number(),
  nPerGroup: z.number(),
  totalN: z.number(),
  power: z.number(),
  targetPower: z.number().nullable(),
  curve: z.array(z.object({ n: z.number(), power: z.number() })),
});
export type PowerResponse = z.infer<typeof powerResponse>;
