import { useState } from "react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { useLockPlan } from "../api/lock-plan";
import type { StudyDto as Study } from "@waymark/contract";

/** Locks the plan, after a confirm step that says it cannot be undone. */
export function LockPlanPanel({ study }: { study: Study }) {
  const lock = useLockPlan(study.id);
  const [confirming, setConfirming] = useState(false);
  const blocked = !study.designComplete || !!study.outOfScope;
  return (
    <section aria-labelledby="lock-title" className="rounded-lg border border-spruce/30 bg-paper p-5">
      <h3 id="lock-title" className="font-semibold">
        Lock the plan
      </h3>
      <p className="mt-1 max-w-prose text-sm">
        Locking records the test policy, the post-hoc method, the adjustment, α and the sample size with the
        date and time, before any data are uploaded. The reviewer sees when it happened.
      </p>
      {blocked && (
        <p className="mt-2 text-sm text-amber-800">
          {study.outOfScope
            ? "This study is out of scope, so there is no plan to lock."
            : (study.designBlocker ?? "Answer all design questions first.")}
        </p>
      )}
      {!confirming ? (
        <Button className="mt-3" disabled={blocked} onClick={() => setConfirming(true)}>
          Lock the plan…
        </Button>
      ) : (
        <div
          role="alertdialog"
          aria-labelledby="lock-confirm-title"
          aria-describedby="lock-confirm-text"
          className="mt-3 rounded-md border-l-4 border-amber bg-amber-100 p-4"
        >
          <p id="lock-confirm-title" className="font-semibold">
            Lock the plan now?
          </p>
          <p id="lock-confirm-text" className="mt-1 max-w-prose text-sm">
            This cannot be undone. The design answers, the test policy, the post-hoc method, the adjustment, α
            and the sample size stay as they are now. A different test can still be chosen later, but only
            with a written reason that the reviewer sees.
          </p>
          <div className="mt-3 flex gap-2">
            <Button
              disabled={lock.isPending}
              onClick={() => lock.mutate(undefined, { onSuccess: () => setConfirming(false) })}
            >
              {lock.isPending ? "Locking…" : "Yes, lock the plan"}
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Not yet
            </Button>
          </div>
        </div>
      )}
      {lock.error && (
        <div className="mt-3">
          <ErrorPanel title="The plan was not locked" message={lock.error.message} />
        </div>
      )}
    </section>
  );
}
