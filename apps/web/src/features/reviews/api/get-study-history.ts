import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { StudyHistory } from "@waymark/contract";
import { reviewKeys } from "./keys";

export function getStudyHistory(studyId: number): Promise<StudyHistory> {
  return api.get<StudyHistory>(`/studies/${studyId}/history`);
}

export const studyHistoryQueryOptions = (studyId: number) =>
  queryOptions({ queryKey: reviewKeys.history(studyId), queryFn: () => getStudyHistory(studyId) });

export function useStudyHistory(studyId: number) {
  return useQuery(studyHistoryQueryOptions(studyId));
}
