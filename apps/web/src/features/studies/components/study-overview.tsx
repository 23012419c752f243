import { Link } from "react-router-dom";
import { studyPath } from "@/config/paths";
import { formatAlpha, formatDateTime } from "@/lib/format";
import { CONTEXT_LABELS } from "@/lib/labels";
import { currentStep, STEP_LABELS, type StepStatus } from "../step-status";
import type { StudyDto as Study } from "@waymark/contract";

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="grid gap-1 border-b border-ink/10 py-2 last:border-0 sm:grid-cols-[10rem_1fr] sm:gap-3">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd>{children}</dd>
    </div>
  );
}

/** What the study is about, and the way on. */
export function StudyOverview({ study, steps }: { study: Study; steps: StepStatus[] }) {
  const next = currentStep(steps);
  return (
    <section aria-labelledby="overview-title">
      <h2 id="overview-title" className="text-2xl font-semibold text-spruce">
        About this study
      </h2>
      <p className="mt-2 max-w-prose">{study.objective}</p>
      <dl className="mt-5 rounded-lg bg-paper p-4 shadow-sm">
        <Row label="Outcome">
          {study.outcomeName}
          {study.outcomeUnit ? ` (${study.outcomeUnit})` : ""}
        </Row>
        <Row label="Grouping factor">{study.factorName}</Row>
        <Row label="Levels">
          <ul className="flex flex-wrap gap-1.5">
            {study.levels.map((l) => (
              <li key={l} className="rounded bg-panel px-2 py-0.5 text-sm">
                {l}
                {l === study.controlLevel && (
                  <span className="ml-1 text-xs font-semibold text-spruce">control</span>
                )}
              </li>
            ))}
          </ul>
        </Row>
        <Row label="Significance level">
          <span className="tabular-nums">α = {formatAlpha(study.plan?.alpha ?? study.alpha)}</span>
        </Row>
        <Row label="Setting">{CONTEXT_LABELS[study.context]}</Row>
        <Row label="Owner">{study.owner?.displayName ?? "—"}</Row>
        <Row label="Created">{formatDateTime(study.createdAt)}</Row>
      </dl>
      <p className="mt-6">
        <Link
          to={studyPath(study.id, next)}
          className="inline-flex rounded-md bg-spruce px-4 py-2 text-sm font-semibold text-stone no-underline hover:bg-spruce-700 hover:no-underline"
        >
          {study.status === "draft" ? `Continue: ${STEP_LABELS[next]}` : `Open: ${STEP_LABELS[next]}`}
        </Link>
      </p>
    </section>
  );
}
