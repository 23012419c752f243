import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { ReportStudy as ApprovedStudy } from "@waymark/contract";
import { reportKeys } from "./keys";

export function getStudies(): Promise<ApprovedStudy[]> {
  return api.get<{ studies: ApprovedStudy[] }>("/studies").then((r) => r.studies);
}

/** The studies list (shared with the study screens' cache), narrowed to the approved ones. */
export const approvedStudiesQueryOptions = queryOptions({
  queryKey: reportKeys.studies,
  queryFn: getStudies,
  select: (studies: ApprovedStudy[]) => studies.filter((s) => s.status === "approved"),
});

export function useApprovedStudies() {
  return useQuery(approvedStudiesQueryOptions);
}
