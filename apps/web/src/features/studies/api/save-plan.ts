import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { Adjustment, Policy, Study } from "../types";
import { storeStudy } from "./get-study";

export interface SavePlanBody {
  policy?: Policy;
  adjust?: Adjustment;
  alpha?: number;
  power?: { effectF: number; targetPower: number };
}

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
