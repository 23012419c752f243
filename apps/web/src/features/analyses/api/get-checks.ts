import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { ChecksResponse } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export function getChecks(id: number, datasetId: number): Promise<ChecksResponse> {
  return api.get<ChecksResponse>(`/studies/${id}/datasets/${datasetId}/checks`);
}

export const checksQueryOptions = (id: number, datasetId: number) =>
  queryOptions({
    queryKey: studyKeys.checks(id, datasetId),
    queryFn: () => getChecks(id, datasetId),
    staleTime: Infinity,
  });

export function useChecks(id: number, datasetId: number | null | undefined) {
  return useQuery({ ...checksQueryOptions(id, datasetId ?? 0), enabled: !!datasetId });
}
