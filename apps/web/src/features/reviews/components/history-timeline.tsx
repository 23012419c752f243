import { CheckCircle2, CircleDot, PenLine, Send, Undo2 } from "lucide-react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { formatDateTime } from "@/lib/format";
import { useStudyHistory } from "../api/get-study-history";
import { STEP_LABELS } from "../labels";
import type { ReviewRound, StudyHistory } from "@waymark/contract";
import { ShortHash } from "@/components/ui/short-hash";

function DecisionLine({ round }: { round: ReviewRound }) {
  if (round.decision === "approved")
    return (
      <p className="flex items-center gap-1.5 font-medium text-spruce">
        <CheckCircle2 aria-hidden="true" className="h-4 w-4" /> Approved
        {round.decidedBy ? ` by ${round.decidedBy.displayName}` : ""}
        <span className="num font-normal text-ink-soft">{formatDateTime(round.decidedAt)}</span>
      </p>
    );
  if (round.decision === "changes_requested")
    return (
      <p className="flex items-center gap-1.5 font-medium text-amber-800">
        <Undo2 aria-hidden="true" className="h-4 w-4" /> Changes requested
        {round.decidedBy ? ` by ${round.decidedBy.displayName}` : ""}
        <span className="num font-normal text-ink-soft">{formatDateTime(round.decidedAt)}</span>
      </p>
    );
  return (
    <p className="flex items-center gap-1.5 text-ink-soft">
      <CircleDot aria-hidden="true" className="h-4 w-4" /> Waiting for a decision
    </p>
  );
}

/** The review rounds and every recorded action of a study, oldest first, from the history data. */
export function HistoryTimelineView({ history }: { history: StudyHistory }) {
  const hasApproval = history.rounds.some((r) => r.decision === "approved");
  return (
    <div className="flex flex-col gap-5" data-testid="history-timeline">
      {hasApproval && !history.approvalValid && history.approvalNote && (
        <p className="rounded-md border-l-4 border-amber bg-amber-100 p-3 text-sm">
          <span className="font-semibold text-amber-800">The approval no longer holds.</span>{" "}
          {history.approvalNote}
        </p>
      )}
      {history.rounds.length === 0 ? (
        <p className="text-sm text-ink-soft">The study has not been submitted for review yet.</p>
      ) : (
        <ol className="flex flex-col gap-4 border-l-2 border-panel pl-5" aria-label="Review rounds">
          {history.rounds.map((r) => (
            <li key={r.id ?? r.round} className="relative">
              <span
                aria-hidden="true"
                className="absolute -left-[1.72rem] top-1 h-3 w-3 rounded-full border-2 border-paper bg-spruce"
              />
              <h4 className="font-semibold">Round {r.round}</h4>
              {r.changes && (
                <p className="text-sm text-ink-soft">
                  Since round {r.changes.sinceRound}: {r.changes.summary.join(" ")}
                </p>
              )}
              <p className="flex items-center gap-1.5 text-sm">
                <Send aria-hidden="true" className="h-4 w-4 text-ink-soft" /> Submitted
                {r.submittedBy ? ` by ${r.submittedBy.displayName}` : ""}
                <span className="num text-ink-soft">{formatDateTime(r.submittedAt)}</span>
              </p>
              <div className="mt-1 text-sm">
                <DecisionLine round={r} />
              </div>
              {r.comments.length > 0 && (
                <ul className="mt-2 flex flex-col gap-2" aria-label={`Comments in round ${r.round}`}>
                  {r.comments.map((c, i) => (
                    <li key={c.id ?? i} className="rounded-md bg-stone p-3 text-sm">
                      <p className="text-xs text-ink-soft">
                        {c.step ? `On the ${STEP_LABELS[c.step] ?? c.step} step` : "On the study as a whole"}
                        {c.author ? ` · ${c.author.displayName}` : ""} ·{" "}
                        <span className="num">{formatDateTime(c.createdAt)}</span>
                      </p>
                      <p className="mt-1 whitespace-pre-wrap break-words">{c.body}</p>
                      {c.replies.length > 0 && (
                        <ul
                          className="mt-2 flex flex-col gap-1.5 border-l-2 border-spruce/30 pl-3"
                          aria-label="Replies"
                        >
                          {c.replies.map((x) => (
                            <li key={x.id}>
                              <p className="text-xs text-ink-soft">
                                {x.author.displayName} replied ·{" "}
                                <span className="num">{formatDateTime(x.createdAt)}</span>
                              </p>
                              <p className="whitespace-pre-wrap break-words">{x.body}</p>
                            </li>
                          ))}
                        </ul>
                      )}
                    </li>
                  ))}
                </ul>
              )}
              {r.signature && (
                <div
                  className="mt-2 rounded-md border border-spruce/30 bg-spruce-100/60 p-3 text-sm"
                  data-testid="signature-record"
                >
                  <p className="flex items-center gap-1.5 font-semibold text-spruce">
                    <PenLine aria-hidden="true" className="h-4 w-4" /> Electronic signature
                  </p>
                  <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5">
                    <dt className="text-ink-soft">Signer</dt>
                    <dd>{r.signature.signerName}</dd>
                    <dt className="text-ink-soft">Signed</dt>
                    <dd className="num">{formatDateTime(r.signature.signedAt)}</dd>
                    <dt className="text-ink-soft">Meaning</dt>
                    <dd>{r.signature.meaning}</dd>
                    <dt className="text-ink-soft">Hash</dt>
                    <dd>
                      <ShortHash hash={r.signature.contentHash} label="hash of what was approved" />
                    </dd>
                  </dl>
                </div>
              )}
            </li>
          ))}
        </ol>
      )}
      <details className="rounded-md bg-stone p-3" open={history.events.length <= 12}>
        <summary className="cursor-pointer text-sm font-semibold">
          Every recorded action ({history.events.length})
        </summary>
        {history.events.length === 0 ? (
          <p className="mt-2 text-sm text-ink-soft">Nothing has been recorded for this study yet.</p>
        ) : (
          <ol className="mt-2 flex flex-col divide-y divide-ink/10 text-sm" aria-label="Audit events">
            {history.events.map((e) => (
              <li key={e.id} className="grid gap-x-3 py-1.5 sm:grid-cols-[11rem_1fr]">
                <span className="num text-ink-soft">{formatDateTime(e.at)}</span>
                <span>
                  {e.summary}
                  <span className="text-ink-soft"> · {e.actorEmail ?? "system"}</span>
                </span>
              </li>
            ))}
          </ol>
        )}
      </details>
    </div>
  );
}

/**
 * A study's history: review rounds with decisions, comments and signatures, then its audit
 * events. Fetches on its own, so any screen can place it with just the study id.
 */
export function HistoryTimeline({ studyId }: { studyId: number }) {
  const history = useStudyHistory(studyId);
  if (history.isPending) return <p className="text-sm text-ink-soft">Loading the history…</p>;
  if (history.error)
    return <ErrorPanel title="The history could not be loaded" message={history.error.message} />;
  return <HistoryTimelineView history={history.data} />;
}
