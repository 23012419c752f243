import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { AnalysisDto as Analysis, RunAnalysisBody, StudyDto as Study } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export type CreateAnalysisBody = RunAnalysisBody;

export function createAnalysis(id: number, body: CreateAnalysisBody): Promise<Analysis> {
  return api.post<{ analysis: Analysis }>(`/studies/${id}/analyses`, { ...body }).then((r) => r.analysis);
}

export function useCreateAnalysis(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateAnalysisBody) => createAnalysis(id, body),
    onSuccess: (analysis) => {
      qc.setQueryData(studyKeys.analysis(id, analysis.id), analysis);
      // The results step opens at once; the refetch below brings the rest of the study.
      qc.setQueryData<Study>(studyKeys.detail(id), (s) => (s ? { ...s, latestAnalysisId: analysis.id } : s));
      void qc.invalidateQueries({ queryKey: studyKeys.analyses(id), exact: true });
      void qc.invalidateQueries({ queryKey: studyKeys.detail(id), exact: true });
      void qc.invalidateQueries({ queryKey: studyKeys.all, exact: true });
    },
    // A run whose instance stopped mid-request is finished by another instance, so a failed
    // request may still have produced an analysis: the list is read again either way.
    onError: () => {
      void qc.invalidateQueries({ queryKey: studyKeys.analyses(id), exact: true });
      void qc.invalidateQueries({ queryKey: studyKeys.detail(id), exact: true });
    },
  });
}
