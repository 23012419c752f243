import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { ReplyBody, ReviewReply } from "@waymark/contract";
import { reviewKeys } from "./keys";

export function replyToComment(studyId: number, commentId: number, input: ReplyBody): Promise<ReviewReply> {
  return api
    .post<{ reply: ReviewReply }>(`/studies/${studyId}/comments/${commentId}/replies`, { ...input })
    .then((r) => r.reply);
}

/** The analyst answers one comment; the study (its open round) and its history change. */
export function useReplyToComment(studyId: number, commentId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ReplyBody) => replyToComment(studyId, commentId, input),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: reviewKeys.studyDetail(studyId), exact: true });
      void qc.invalidateQueries({ queryKey: reviewKeys.history(studyId) });
    },
  });
}
