import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { DatasetDto as Dataset } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export function getDatasets(id: number): Promise<Dataset[]> {
  return api.get<{ datasets: Dataset[] }>(`/studies/${id}/datasets`).then((r) => r.datasets);
}

export const datasetsQueryOptions = (id: number) =>
  queryOptions({ queryKey: studyKeys.datasets(id), queryFn: () => getDatasets(id) });

export function useDatasets(id: number) {
  return useQuery(datasetsQueryOptions(id));
}
