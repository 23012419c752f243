import { Link } from "react-router-dom";
import { reportPath, reviewPath, studyPath } from "@/config/paths";
import type { User } from "@/lib/current-user";
import type { StudyDto as Study } from "@waymark/contract";

/** Where the server's next step leads this person: the study's step, the review page or the report. */
function linkFor(s: Study): string {
  const where = s.progress.nextStep.where;
  if (where === "review") return reviewPath(s.id);
  if (where === "report") return reportPath(s.id);
  return studyPath(s.id, where);
}

/**
 * The studies whose next step is this person's, by the server's one status: an analyst's own
 * studies (sent-back ones first), a reviewer's queue, a writer's approved reports. Pure.
 */
export function waitingFor(user: User, studies: Study[]): Study[] {
  return studies
    .filter(
      (s) => s.progress.nextStep.who === user.role && (user.role !== "analyst" || s.owner?.id === user.id),
    )
    .sort(
      (a, b) =>
        Number(b.progress.state === "changes-requested") - Number(a.progress.state === "changes-requested") ||
        (b.updatedAt ?? "").localeCompare(a.updatedAt ?? ""),
    );
}

export function WaitingForYou({ user, studies }: { user: User; studies: Study[] }) {
  const mine = waitingFor(user, studies);
  if (user.role === "admin") return null;
  return (
    <section aria-labelledby="waiting-title" className="mt-8 max-w-2xl">
      <h2 id="waiting-title" className="text-lg font-semibold text-spruce">
        Waiting for you
      </h2>
      {mine.length === 0 ? (
        <p className="mt-2 text-sm text-ink-soft">Nothing waits for you right now.</p>
      ) : (
        <ul className="mt-2 flex flex-col gap-2">
          {mine.map((s) => {
            const sentBack = s.progress.state === "changes-requested";
            return (
              <li
                key={s.id}
                data-testid="waiting-item"
                className={`rounded-md p-3 shadow-sm ${sentBack ? "bg-brick-100 ring-1 ring-brick/40" : "bg-paper"}`}
              >
                <p className="flex flex-wrap items-center gap-2">
                  <Link to={linkFor(s)} className="break-words font-semibold">
                    {s.title}
                  </Link>
                  <span className={`text-xs font-semibold ${sentBack ? "text-brick" : "text-ink-soft"}`}>
                    {s.progress.label}
                  </span>
                </p>
                <p className="mt-1 text-sm">{s.progress.detail}</p>
                <p className="mt-1 text-sm font-medium">Next: {s.progress.nextStep.action}.</p>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
