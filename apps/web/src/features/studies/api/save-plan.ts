import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { PlanBody, StudyDto as Study } from "@waymark/contract";
import { storeStudy } from "@/lib/study-cache";

export type SavePlanBody = PlanBody;

export function savePlan(id: number, body: SavePlanBody): Promise<Study> {
  return api.put<{ study: Study }>(`/studies/${id}/plan`, { ...body }).then((r) => r.study);
}

export function useSavePlan(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SavePlanBody) => savePlan(id, body),
    onSuccess: (study) => storeStudy(qc, study),
  });
}
