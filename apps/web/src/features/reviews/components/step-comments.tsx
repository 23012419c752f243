import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { TextArea } from "@/components/ui/text-area";
import { formatDateTime } from "@/lib/format";
import { LIMITS, type OpenReview, type ReviewStep } from "@waymark/contract";
import { useReplyToComment } from "../api/reply-to-comment";
import { STEP_LABELS } from "../labels";

type Comment = OpenReview["comments"][number];

function ReplyForm({ studyId, comment }: { studyId: number; comment: Comment }) {
  const [body, setBody] = useState("");
  const [error, setError] = useState<string | undefined>();
  const reply = useReplyToComment(studyId, comment.id);
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const text = body.trim();
    if (!text) return setError("Write the reply");
    if (text.length > LIMITS.comment) return setError(`A reply holds at most ${LIMITS.comment} characters`);
    setError(undefined);
    reply.mutate({ body: text }, { onSuccess: () => setBody("") });
  };
  return (
    <form onSubmit={onSubmit} className="mt-2 flex flex-col gap-2" noValidate>
      <TextArea
        label="Your reply"
        rows={2}
        value={body}
        onChange={(e) => setBody(e.target.value)}
        error={error ?? (reply.error ? reply.error.message : undefined)}
      />
      <div>
        <Button type="submit" variant="secondary" disabled={reply.isPending}>
          {reply.isPending ? "Sending…" : "Reply"}
        </Button>
      </div>
    </form>
  );
}

/**
 * The open review round's comments on one step of the study, with the analyst's replies under
 * each and, for the analyst who may still change the study, a reply form. The comments on the
 * study as a whole stand with the results.
 */
export function StepComments({
  studyId,
  review,
  step,
  canReply,
}: {
  studyId: number;
  review: OpenReview | null;
  step: ReviewStep;
  canReply: boolean;
}) {
  const comments = (review?.comments ?? []).filter(
    (c) => c.step === step || (step === "results" && c.step === null),
  );
  if (!review || comments.length === 0) return null;
  return (
    <section
      aria-label={`Reviewer's comments on the ${STEP_LABELS[step]} step`}
      data-testid="step-comments"
      className="mb-6 rounded-lg border-l-4 border-brick bg-brick-100/60 p-4"
    >
      <h2 className="font-semibold text-brick">
        Reviewer's comments, round {review.round}
        {review.decidedBy ? ` · ${review.decidedBy.displayName}` : ""}
      </h2>
      <ul className="mt-2 flex flex-col gap-3">
        {comments.map((c) => (
          <li key={c.id} className="rounded-md bg-paper p-3 text-sm shadow-sm">
            <p className="text-xs text-ink-soft">
              {c.step
                ? `On the ${STEP_LABELS[c.step as ReviewStep] ?? c.step} step`
                : "On the study as a whole"}{" "}
              · {c.author.displayName} · <span className="num">{formatDateTime(c.createdAt)}</span>
            </p>
            <p className="mt-1 whitespace-pre-wrap break-words">{c.body}</p>
            {c.replies.length > 0 && (
              <ul className="mt-2 flex flex-col gap-2 border-l-2 border-spruce/30 pl-3" aria-label="Replies">
                {c.replies.map((r) => (
                  <li key={r.id}>
                    <p className="text-xs text-ink-soft">
                      {r.author.displayName} replied ·{" "}
                      <span className="num">{formatDateTime(r.createdAt)}</span>
                    </p>
                    <p className="whitespace-pre-wrap break-words">{r.body}</p>
                  </li>
                ))}
              </ul>
            )}
            {canReply && <ReplyForm studyId={studyId} comment={c} />}
          </li>
        ))}
      </ul>
    </section>
  );
}
