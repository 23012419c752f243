import type { StudyStepSegment } from "@/config/paths";
import type { StudyDto as Study } from "@waymark/contract";
import { STEP_LABELS } from "../step-status";

/**
 * The top of a study: the server's one status (its sentence and the next step). After "request
 * changes" it stands out and says where the reviewer's comments are.
 */
export function ProgressBanner({ study }: { study: Study }) {
  const p = study.progress;
  const sentBack = p.state === "changes-requested";
  const comments = study.openReview?.comments ?? [];
  const steps = [...new Set(comments.map((c) => c.step).filter((s): s is string => !!s))].map(
    (s) => STEP_LABELS[s as StudyStepSegment] ?? s,
  );
  return (
    <div
      role={sentBack ? "alert" : "status"}
      data-testid="progress-banner"
      className={`mb-6 rounded-lg p-4 ${sentBack ? "bg-brick-100 ring-1 ring-brick/40" : "bg-panel"}`}
    >
      <p className={`font-semibold ${sentBack ? "text-brick" : "text-spruce"}`}>{p.label}</p>
      <p className="mt-1 text-sm">{p.detail}</p>
      {sentBack && comments.length > 0 && (
        <p className="mt-1 text-sm">
          {steps.length
            ? `The comments stand at the step they concern: ${steps.join(", ")}.`
            : "The comments are on the results step."}{" "}
          Reply to each one there.
        </p>
      )}
      <p className="mt-1 text-sm text-ink-soft">
        Next, for the {p.nextStep.who}: {p.nextStep.action}.
      </p>
    </div>
  );
}
