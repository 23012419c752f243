import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { DesignAnswers, StudyDto as Study } from "@waymark/contract";
import { storeStudy } from "@/lib/study-cache";

/** Saves one or more design answers as they are given. */
export function saveDesign(id: number, answers: DesignAnswers): Promise<Study> {
  return api.put<{ study: Study }>(`/studies/${id}/design`, { ...answers }).then((r) => r.study);
}

export function useSaveDesign(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (answers: DesignAnswers) => saveDesign(id, answers),
    onSuccess: (study) => storeStudy(qc, study),
  });
}
