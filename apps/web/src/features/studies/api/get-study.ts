import { queryOptions, useQuery, type QueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { Study } from "../types";
import { studyKeys } from "@/lib/query-keys";

export function getStudy(id: number): Promise<Study> {
  return api.get<{ study: Study }>(`/studies/${id}`).then((r) => r.study);
}

export const studyQueryOptions = (id: number) =>
  queryOptions({ queryKey: studyKeys.detail(id), queryFn: () => getStudy(id) });

export function useStudy(id: number) {
  return useQuery(studyQueryOptions(id));
}

/** After a mutation answers with the study: update its detail and refresh the list. */
export function storeStudy(qc: QueryClient, study: Study) {
  qc.setQueryData(studyKeys.detail(study.id), study);
  void qc.invalidateQueries({ queryKey: studyKeys.all, exact: true });
}
