import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { ReportExport } from "@waymark/contract";
import { reportKeys } from "./keys";

export function getReportExports(studyId: number): Promise<ReportExport[]> {
  return api.get<{ exports: ReportExport[] }>(`/studies/${studyId}/report/exports`).then((r) => r.exports);
}

export const reportExportsQueryOptions = (studyId: number) =>
  queryOptions({ queryKey: reportKeys.exports(studyId), queryFn: () => getReportExports(studyId) });

export function useReportExports(studyId: number) {
  return useQuery(reportExportsQueryOptions(studyId));
}
