import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { api } from "@/lib/api-client";
import { alpha, LIMITS, studyContext, type CreateStudyBody, type StudyDto as Study } from "@waymark/contract";
import { storeStudy } from "@/lib/study-cache";

const text = (what: string, max: number) =>
  z.string().trim().min(1, `Enter ${what}`).max(max, `Keep ${what} under ${max} characters`);

export const createStudyInputSchema = z
  .object({
    title: text("a title", LIMITS.title),
    objective: text("the objective", LIMITS.objective),
    outcomeName: text("the outcome's name", LIMITS.outcomeName),
    outcomeUnit: z
      .string()
      .trim()
      .max(LIMITS.outcomeUnit, `Keep the unit under ${LIMITS.outcomeUnit} characters`),
    factorName: text("the grouping factor's name", LIMITS.factorName),
    levels: z.array(z.object({ name: z.string().trim() })),
    hasControl: z.boolean(),
    controlLevel: z.string(),
    alpha,
    context: studyContext,
  })
  .superRefine((v, ctx) => {
    const names = v.levels.map((l) => l.name).filter((n) => n.length > 0);
    if (names.length < LIMITS.minLevels)
      ctx.addIssue({ code: "custom", path: ["levels"], message: "Name at least two groups" });
    if (names.length > LIMITS.maxLevels)
      ctx.addIssue({ code: "custom", path: ["levels"], message: `At most ${LIMITS.maxLevels} groups` });
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

export type { CreateStudyBody };

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
