import { Link } from "react-router-dom";
import { studyPath } from "@/config/paths";
import { formatDate } from "@/lib/format";
import { CONTEXT_LABELS } from "@/lib/labels";
import type { StudyDto as Study } from "@waymark/contract";
import { ProgressBadge } from "./progress-badge";

/** Sent back first (the analyst's work waits there), then the most recently changed. */
export function byAttention(a: Study, b: Study): number {
  const sentBack = (s: Study) => (s.progress.state === "changes-requested" ? 0 : 1);
  return sentBack(a) - sentBack(b) || (b.updatedAt ?? "").localeCompare(a.updatedAt ?? "");
}

/** Every study the signed-in person may see, newest first, with where each one stands. */
export function StudyList({ studies }: { studies: Study[] }) {
  if (studies.length === 0) {
    return <p className="rounded-lg bg-paper p-6 text-ink-soft shadow-sm">No studies yet.</p>;
  }
  const sorted = [...studies].sort(byAttention);
  return (
    <ul className="flex flex-col gap-3" aria-label="Studies">
      {sorted.map((s) => {
        return (
          <li key={s.id} className="rounded-lg bg-paper p-4 shadow-sm ring-1 ring-ink/5">
            <div className="flex flex-wrap items-center gap-3">
              <Link to={studyPath(s.id)} className="break-words text-lg font-semibold">
                {s.title}
              </Link>
              <ProgressBadge progress={s.progress} />
              {s.context !== "general" && (
                <span className="text-xs font-medium uppercase tracking-wide text-ink-soft">
                  {CONTEXT_LABELS[s.context]}
                </span>
              )}
            </div>
            <p className="mt-1 text-sm text-ink-soft">
              {s.outcomeName}
              {s.outcomeUnit ? ` (${s.outcomeUnit})` : ""} across {s.levels.length} levels of {s.factorName} ·{" "}
              {s.owner?.displayName ?? "—"} · updated {formatDate(s.updatedAt)}
            </p>
            <p className="mt-2 text-sm">
              <span className="text-ink-soft">{s.progress.detail}</span>{" "}
              <span className="font-medium">Next: {s.progress.nextStep.action}.</span>
            </p>
          </li>
        );
      })}
    </ul>
  );
}
