import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { AnalysisDto as Analysis } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export function getAnalyses(id: number): Promise<Analysis[]> {
  return api.get<{ analyses: Analysis[] }>(`/studies/${id}/analyses`).then((r) => r.analyses);
}

export const analysesQueryOptions = (id: number) =>
  queryOptions({ queryKey: studyKeys.analyses(id), queryFn: () => getAnalyses(id) });

export function useAnalyses(id: number) {
  return useQuery(analysesQueryOptions(id));
}
