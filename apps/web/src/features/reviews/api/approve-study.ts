import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { api } from "@/lib/api-client";
import type { StudyDto as ReviewStudy } from "@waymark/contract";
import { reviewKeys } from "./keys";

export const DEFAULT_MEANING = "Approved as the analysis of record";

export const approveInputSchema = z.object({
  password: z.string().min(1, "Re-enter your password to sign"),
  meaning: z
    .string()
    .trim()
    .min(5, "State what your signature means, for example: approved as the analysis of record")
    .max(300, "Keep the meaning to 300 characters or fewer"),
});
export type ApproveInput = z.infer<typeof approveInputSchema>;

export function approveStudy(studyId: number, input: ApproveInput): Promise<ReviewStudy> {
  return api.post<{ study: ReviewStudy }>(`/studies/${studyId}/approve`, input).then((r) => r.study);
}

/** Signs the approval; the study, its history and the queue all change. */
export function useApproveStudy(studyId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ApproveInput) => approveStudy(studyId, input),
    onSuccess: () => {
      // The study and its history change; its stored analyses and checks do not.
      void qc.invalidateQueries({ queryKey: reviewKeys.studyDetail(studyId), exact: true });
      void qc.invalidateQueries({ queryKey: reviewKeys.history(studyId) });
      void qc.invalidateQueries({ queryKey: reviewKeys.studyList, exact: true });
      void qc.invalidateQueries({ queryKey: reviewKeys.queue });
    },
  });
}
