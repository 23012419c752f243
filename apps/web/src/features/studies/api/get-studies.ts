import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { StudyDto as Study } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export function getStudies(): Promise<Study[]> {
  return api.get<{ studies: Study[] }>("/studies").then((r) => r.studies);
}

export const studiesQueryOptions = queryOptions({ queryKey: studyKeys.all, queryFn: getStudies });

export function useStudies() {
  return useQuery(studiesQueryOptions);
}
