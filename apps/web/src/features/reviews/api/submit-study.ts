import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { StudyDto as Study } from "@waymark/contract";
import { storeStudy } from "@/lib/study-cache";

export function submitStudy(id: number, analysisId: number): Promise<Study> {
  return api.post<{ study: Study }>(`/studies/${id}/submit`, { analysisId }).then((r) => r.study);
}

export function useSubmitStudy(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (analysisId: number) => submitStudy(id, analysisId),
    onSuccess: (study) => {
      storeStudy(qc, study);
      void qc.invalidateQueries({ queryKey: ["studies", id, "history"] });
    },
  });
}
