import { useState } from "react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { ConfirmBox } from "@/components/ui/confirm-box";
import { useSubmitStudy } from "../api/submit-study";
import type { StudyDto as Study } from "@waymark/contract";

/** Sends the study to a reviewer, after a confirm step saying what the submission freezes. */
export function SubmitPanel({ study, analysisId }: { study: Study; analysisId: number }) {
  const submit = useSubmitStudy(study.id);
  const [confirming, setConfirming] = useState(false);
  if (study.status === "in_review") {
    return (
      <p className="rounded-md bg-panel p-4 text-sm">
        Submitted for review: a reviewer will approve it or send it back with comments.
      </p>
    );
  }
  if (study.status === "approved") {
    return (
      <p className="rounded-md bg-spruce-100 p-4 text-sm font-medium text-spruce">
        Approved by a reviewer. Writers can now download the report.
      </p>
    );
  }
  return (
    <section aria-labelledby="submit-title" className="rounded-lg border border-spruce/30 bg-paper p-5">
      <h3 id="submit-title" className="font-semibold">
        Submit for review
      </h3>
      <p className="mt-1 max-w-prose text-sm">
        A reviewer checks the plan, the checks, the choice of test and these results, then approves them with
        an electronic signature or sends the study back with comments. Nobody can approve their own study.
      </p>
      {!confirming ? (
        <Button className="mt-3" onClick={() => setConfirming(true)}>
          Submit for review…
        </Button>
      ) : (
        <ConfirmBox
          title="Submit this analysis?"
          confirmLabel="Yes, submit"
          pendingLabel="Submitting…"
          pending={submit.isPending}
          onConfirm={() => submit.mutate(analysisId, { onSuccess: () => setConfirming(false) })}
          onCancel={() => setConfirming(false)}
        >
          While it is in review, the study, its data and this analysis cannot change.
        </ConfirmBox>
      )}
      {submit.error && (
        <div className="mt-3">
          <ErrorPanel title="The study was not submitted" message={submit.error.message} />
        </div>
      )}
    </section>
  );
}
