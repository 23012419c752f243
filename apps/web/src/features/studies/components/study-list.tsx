import { Link } from "react-router-dom";
import { studyPath } from "@/config/paths";
import { formatDate } from "@/lib/format";
import { CONTEXT_LABELS } from "@/lib/labels";
import { studySteps } from "../step-status";
import type { StudyDto as Study } from "@waymark/contract";
import { LifecycleBadge } from "./lifecycle-badge";

/** Every study the signed-in person may see, newest first, with where each one stands. */
export function StudyList({ studies }: { studies: Study[] }) {
  if (studies.length === 0) {
    return <p className="rounded-lg bg-paper p-6 text-ink-soft shadow-sm">No studies yet.</p>;
  }
  const sorted = [...studies].sort((a, b) => (b.updatedAt ?? "").localeCompare(a.updatedAt ?? ""));
  return (
    <ul className="flex flex-col gap-3" aria-label="Studies">
      {sorted.map((s) => {
        const steps = studySteps(s);
        const next = steps.find((x) => x.state === "open");
        return (
          <li key={s.id} className="rounded-lg bg-paper p-4 shadow-sm ring-1 ring-ink/5">
            <div className="flex flex-wrap items-center gap-3">
              <Link to={studyPath(s.id)} className="text-lg font-semibold">
                {s.title}
              </Link>
              <LifecycleBadge status={s.status} />
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
              {next ? (
                <>
                  <span className="font-medium">Next: {next.label}</span>{" "}
                  <span className="text-ink-soft">— {next.fact}</span>
                </>
              ) : (
                <span className="text-ink-soft">Every analysis step is done.</span>
              )}
            </p>
          </li>
        );
      })}
    </ul>
  );
}
