import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { StudyDto as Study } from "@waymark/contract";
import type { CreateStudyBody } from "./create-study";
import { storeStudy } from "@/lib/study-cache";

export type UpdateStudyBody = Partial<CreateStudyBody>;

export function updateStudy(id: number, body: UpdateStudyBody): Promise<Study> {
  return api.patch<{ study: Study }>(`/studies/${id}`, { ...body }).then((r) => r.study);
}

export function useUpdateStudy(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateStudyBody) => updateStudy(id, body),
    onSuccess: (study) => storeStudy(qc, study),
  });
}
