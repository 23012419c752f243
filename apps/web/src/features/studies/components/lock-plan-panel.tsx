import { useState } from "react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { ConfirmBox } from "@/components/ui/confirm-box";
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
        Locking records the primary test and its post-hoc method, the adjustment, α and the sample size with
        the date and time, before any data are uploaded. The reviewer sees when it happened.
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
        <ConfirmBox
          title="Lock the plan now?"
          confirmLabel="Yes, lock the plan"
          pendingLabel="Locking…"
          pending={lock.isPending}
          onConfirm={() => lock.mutate(undefined, { onSuccess: () => setConfirming(false) })}
          onCancel={() => setConfirming(false)}
        >
          This cannot be undone. The design answers, the primary test and its post-hoc method, the adjustment,
          α and the sample size stay as they are now. Running another test later is a deviation from the plan:
          it needs a written justification, and the reviewer and the report show it.
        </ConfirmBox>
      )}
      {lock.error && (
        <div className="mt-3">
          <ErrorPanel title="The plan was not locked" message={lock.error.message} />
        </div>
      )}
    </section>
  );
}
