import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { StudyDto as Study } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export function getStudy(id: number): Promise<Study> {
  return api.get<{ study: Study }>(`/studies/${id}`).then((r) => r.study);
}

export const studyQueryOptions = (id: number) =>
  queryOptions({ queryKey: studyKeys.detail(id), queryFn: () => getStudy(id) });

export function useStudy(id: number) {
  return useQuery(studyQueryOptions(id));
}
