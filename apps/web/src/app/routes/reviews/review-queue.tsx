import { ErrorPanel } from "@/components/errors/error-panel";
import { useReviewQueue } from "@/features/reviews/api/get-review-queue";
import { ReviewQueueTable } from "@/features/reviews/components/review-queue-table";

export function ReviewQueueRoute() {
  const queue = useReviewQueue();
  return (
    <div className="flex flex-col gap-6">
      <header>
        <h1 className="text-3xl font-semibold text-spruce">Review queue</h1>
        <p className="mt-1 max-w-prose text-ink-soft">
          Studies their analysts have submitted, longest-waiting first. An amber marker means the analyst
          deviated from the plan's primary test; read their justification before you decide.
        </p>
      </header>
      {queue.isPending && <p className="text-ink-soft">Loading the queue…</p>}
      {queue.error && <ErrorPanel title="The queue could not be loaded" message={queue.error.message} />}
      {queue.data && <ReviewQueueTable queue={queue.data} />}
    </div>
  );
}
