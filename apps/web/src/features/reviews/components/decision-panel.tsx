import { CheckCircle2, Undo2 } from "lucide-react";
import { useState } from "react";
import { formatDateTime } from "@/lib/format";
import type { StudyDto as ReviewStudy, StudyHistory } from "@waymark/contract";
import { ApproveForm } from "./approve-form";
import { RequestChangesForm } from "./request-changes-form";
import { ShortHash } from "@/components/ui/short-hash";

type Choice = "approve" | "changes";

/**
 * Where the reviewer decides: approve with an electronic signature, or send the study back with
 * comments. Once decided it shows the outcome instead of the forms.
 */
export function DecisionPanel({
  study,
  history,
  me,
}: {
  study: ReviewStudy;
  history: StudyHistory | undefined;
  me: { id: number; displayName: string };
}) {
  const [choice, setChoice] = useState<Choice>("approve");
  const [done, setDone] = useState<string | null>(null);
  const lastRound = history?.rounds.at(-1);

  if (study.status === "approved") {
    const sig = [...(history?.rounds ?? [])].reverse().find((r) => r.signature)?.signature;
    return (
      <section
        aria-labelledby="decision-title"
        className="rounded-lg border-l-4 border-spruce bg-paper p-5 shadow-sm"
        data-testid="decision-panel"
      >
        <h2 id="decision-title" className="flex items-center gap-2 text-lg font-semibold text-spruce">
          <CheckCircle2 aria-hidden="true" className="h-5 w-5" /> Approved
        </h2>
        {done && (
          <p role="status" className="mt-1 text-sm">
            {done}
          </p>
        )}
        {sig && (
          <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
            <dt className="text-ink-soft">Signed by</dt>
            <dd>{sig.signerName}</dd>
            <dt className="text-ink-soft">When</dt>
            <dd className="num">{formatDateTime(sig.signedAt)}</dd>
            <dt className="text-ink-soft">Meaning</dt>
            <dd>{sig.meaning}</dd>
            <dt className="text-ink-soft">Hash</dt>
            <dd>
              <ShortHash hash={sig.contentHash} label="hash of what was approved" />
            </dd>
          </dl>
        )}
        {history && !history.approvalValid && history.approvalNote && (
          <p className="mt-3 rounded-md border-l-4 border-amber bg-amber-100 p-2 text-sm">
            {history.approvalNote}
          </p>
        )}
      </section>
    );
  }

  if (study.status !== "in_review") {
    return (
      <section
        aria-labelledby="decision-title"
        className="rounded-lg bg-paper p-5 shadow-sm"
        data-testid="decision-panel"
      >
        <h2 id="decision-title" className="text-lg font-semibold">
          Not waiting for a decision
        </h2>
        {done ? (
          <p role="status" className="mt-1 text-sm">
            {done}
          </p>
        ) : (
          <p className="mt-1 text-sm">
            This study is a draft with its analyst. It comes back to the review queue when it is submitted
            again.
          </p>
        )}
      </section>
    );
  }

  return (
    <section
      aria-labelledby="decision-title"
      className="rounded-lg bg-paper p-5 shadow-sm"
      data-testid="decision-panel"
    >
      <h2 id="decision-title" className="text-lg font-semibold">
        Your decision{lastRound ? ` on round ${lastRound.round}` : ""}
      </h2>
      {study.owner?.id === me.id && (
        <p className="mt-2 rounded-md border-l-4 border-amber bg-amber-100 p-2 text-sm">
          You created this study, so another reviewer must decide on it.
        </p>
      )}
      <div
        role="group"
        aria-label="Choose a decision"
        className="mt-3 grid max-w-md grid-cols-2 gap-1 rounded-md bg-stone p-1"
      >
        <button
          type="button"
          aria-pressed={choice === "approve"}
          onClick={() => setChoice("approve")}
          className={`flex items-center justify-center gap-1.5 rounded px-2 py-1.5 text-sm font-semibold ${choice === "approve" ? "bg-spruce text-stone" : "text-ink hover:bg-panel"}`}
        >
          <CheckCircle2 aria-hidden="true" className="h-4 w-4" /> Approve
        </button>
        <button
          type="button"
          aria-pressed={choice === "changes"}
          onClick={() => setChoice("changes")}
          className={`flex items-center justify-center gap-1.5 rounded px-2 py-1.5 text-sm font-semibold ${choice === "changes" ? "bg-spruce text-stone" : "text-ink hover:bg-panel"}`}
        >
          <Undo2 aria-hidden="true" className="h-4 w-4" /> Request changes
        </button>
      </div>
      <div className="mt-4 max-w-2xl">
        {choice === "approve" ? (
          <ApproveForm
            studyId={study.id}
            signerName={me.displayName}
            onApproved={() => setDone("Your signature was recorded and the study is approved.")}
          />
        ) : (
          <RequestChangesForm
            studyId={study.id}
            onSent={() => setDone("The study went back to its analyst with your comments.")}
          />
        )}
      </div>
    </section>
  );
}
