import { z } from "zod";

/** Multipart fields that come with an upload; text fields, so empty strings mean "not given". */
export const columnChoiceSchema = z
  .object({
    layout: z
      .enum(
        ["long", "wide"],
        "layout must be long (a group column and an outcome column) or wide (one column per group)",
      )
      .default("long"),
    groupColumn: z.string().max(200).optional(),
    outcomeColumn: z.string().max(200).optional(),
  })
  .refine((c) => c.layout === "wide" || (!!c.groupColumn && !!c.outcomeColumn), {
    message: "Name the group column and the outcome column, or choose the wide layout",
    path: ["groupColumn"],
  });
