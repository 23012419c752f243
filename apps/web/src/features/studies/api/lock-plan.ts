import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { StudyDto as Study } from "@waymark/contract";
import { storeStudy } from "@/lib/study-cache";

export function lockPlan(id: number): Promise<Study> {
  return api.post<{ study: Study }>(`/studies/${id}/plan/lock`).then((r) => r.study);
}

export function useLockPlan(id: number) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: () => lockPlan(id), onSuccess: (study) => storeStudy(qc, study) });
}
