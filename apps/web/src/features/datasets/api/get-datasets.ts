import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { DatasetListItem } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

/** Every version, newest first; `active` marks the one analyses and submissions use. */
export function getDatasets(id: number): Promise<DatasetListItem[]> {
  return api.get<{ datasets: DatasetListItem[] }>(`/studies/${id}/datasets`).then((r) => r.datasets);
}

export const datasetsQueryOptions = (id: number) =>
  queryOptions({ queryKey: studyKeys.datasets(id), queryFn: () => getDatasets(id) });

export function useDatasets(id: number) {
  return useQuery(datasetsQueryOptions(id));
}
