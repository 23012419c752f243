import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { AnalysisDto as Analysis } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export function getAnalysis(id: number, analysisId: number): Promise<Analysis> {
  return api.get<{ analysis: Analysis }>(`/studies/${id}/analyses/${analysisId}`).then((r) => r.analysis);
}

export const analysisQueryOptions = (id: number, analysisId: number) =>
  queryOptions({
    queryKey: studyKeys.analysis(id, analysisId),
    queryFn: () => getAnalysis(id, analysisId),
    staleTime: Infinity,
  });

export function useAnalysis(id: number, analysisId: number | null | undefined) {
  return useQuery({ ...analysisQueryOptions(id, analysisId ?? 0), enabled: !!analysisId });
}
