import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { RequestChangesBody, StudyDto as ReviewStudy } from "@waymark/contract";
import { reviewKeys } from "./keys";

export type RequestChangesInput = RequestChangesBody;

export function requestChanges(studyId: number, input: RequestChangesInput): Promise<ReviewStudy> {
  return api
    .post<{ study: ReviewStudy }>(`/studies/${studyId}/request-changes`, { ...input })
    .then((r) => r.study);
}

/** Sends the study back to its analyst; the study, its history and the queue all change. */
export function useRequestChanges(studyId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: RequestChangesInput) => requestChanges(studyId, input),
    onSuccess: () => {
      // The study and its history change; its stored analyses and checks do not.
      void qc.invalidateQueries({ queryKey: reviewKeys.studyDetail(studyId), exact: true });
      void qc.invalidateQueries({ queryKey: reviewKeys.history(studyId) });
      void qc.invalidateQueries({ queryKey: reviewKeys.studyList, exact: true });
      void qc.invalidateQueries({ queryKey: reviewKeys.queue });
    },
  });
}
