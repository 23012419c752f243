import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { ReportPreview } from "@waymark/contract";
import { reportKeys } from "./keys";

export function getReportPreview(studyId: number, draft = false): Promise<ReportPreview> {
  return api.get<ReportPreview>(`/studies/${studyId}/report/preview${draft ? "?draft=1" : ""}`);
}

export const reportPreviewQueryOptions = (studyId: number, draft = false) =>
  queryOptions({
    queryKey: reportKeys.preview(studyId, draft),
    queryFn: () => getReportPreview(studyId, draft),
  });

export function useReportPreview(studyId: number, draft = false) {
  return useQuery(reportPreviewQueryOptions(studyId, draft));
}
