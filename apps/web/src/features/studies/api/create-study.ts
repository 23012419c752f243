import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { api } from "@/lib/api-client";
import type { Study } from "../types";
import { storeStudy } from "./get-study";

const text = (what: string, max = 200) =>
  z.string().trim().min(1, `Enter ${what}`).max(max, `Keep ${what} under ${max} characters`);

export const createStudyInputSchema = z
  .object({
    title: text("a title", 160),
    objective: text("the objective", 2000),
    outcomeName: text("the outcome's name", 120),
    outcomeUnit: z.string().trim().max(40, "Keep the unit under 40 characters"),
    factorName: text("the grouping factor's name", 120),
    levels: z.array(z.object({ name: z.string().trim() })),
    hasControl: z.boolean(),
    controlLevel: z.string(),
    alpha: z
      .number({ error: "Enter α as a number, for example 0.05" })
      .gt(0, "α must be above 0")
      .max(0.2, "α must be at most 0.2"),
    context: z.enum(["general", "clinical", "safety-critical"]),
  })
  .superRefine((v, ctx) => {
    const names = v.levels.map((l) => l.name).filter((n) => n.length > 0);
    if (names.length < 2)
      ctx.addIssue({ code: "custom", path: ["levels"], message: "Name at least two groups" });
    if (names.length > 20) ctx.addIssue({ code: "custom", path: ["levels"], message: "At most 20 groups" });
    const dup = names.find((n, i) => names.indexOf(n) !== i);
    if (dup)
      ctx.addIssue({
        code: "custom",
        path: ["levels"],
        message: `“${dup}” is listed twice; each group needs its own name`,
      });
    if (v.hasControl && !names.includes(v.controlLevel))
      ctx.addIssue({ code: "custom", path: ["controlLevel"], message: "Pick which group is the control" });
  });
export type CreateStudyForm = z.infer<typeof createStudyInputSchema>;

export interface CreateStudyBody {
  title: string;
  objective: string;
  outcomeName: string;
  outcomeUnit: string;
  factorName: string;
  levels: string[];
  controlLevel: string | null;
  alpha: number;
  context: Study["context"];
}

export function toCreateStudyBody(v: CreateStudyForm): CreateStudyBody {
  return {
    title: v.title,
    objective: v.objective,
    outcomeName: v.outcomeName,
    outcomeUnit: v.outcomeUnit,
    factorName: v.factorName,
    levels: v.levels.map((l) => l.name).filter((n) => n.length > 0),
    controlLevel: v.hasControl ? v.controlLevel : null,
    alpha: v.alpha,
    context: v.context,
  };
}

export function createStudy(body: CreateStudyBody): Promise<Study> {
  return api.post<{ study: Study }>("/studies", { ...body }).then((r) => r.study);
}

export function useCreateStudy() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createStudy, onSuccess: (study) => storeStudy(qc, study) });
}
