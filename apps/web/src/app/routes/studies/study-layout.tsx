import { Link, Outlet, useLocation, useParams } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { paths, STUDY_STEP_SEGMENTS, type StudyStepSegment } from "@/config/paths";
import { useMe } from "@/lib/current-user";
import { useAnalysis } from "@/features/analyses/api/get-analysis";
import { useStudy } from "@/features/studies/api/get-study";
import { ProgressBadge } from "@/features/studies/components/progress-badge";
import { ProgressBanner } from "@/features/studies/components/progress-banner";
import { PlanLockedNote } from "@/features/studies/components/plan-locked-note";
import { StudyTrail } from "@/features/studies/components/study-trail";
import { StepComments } from "@/features/reviews/components/step-comments";
import { CONTEXT_LABELS } from "@/lib/labels";
import { studySteps } from "@/features/studies/step-status";
import { can } from "@/lib/authorization";
import type { StudyOutletContext } from "./study-context";

/** The study page: the trail of steps down the left, the current step on the right. */
export function StudyLayoutRoute() {
  const { studyId } = useParams();
  const id = Number(studyId);
  const me = useMe();
  const study = useStudy(id);
  const latest = useAnalysis(id, study.data?.latestAnalysisId);
  const location = useLocation();

  if (!Number.isInteger(id) || id <= 0)
    return <ErrorPanel title="No such study" message="The address does not name a study." />;
  if (study.isPending) return <p className="text-ink-soft">Loading the study…</p>;
  if (study.error) return <ErrorPanel title="The study could not be loaded" message={study.error.message} />;

  const s = study.data;
  const latestAnalysis = latest.data ?? null;
  const steps = studySteps(s, latestAnalysis);
  const canEdit =
    !!me.data && can(me.data.role, "studies:create") && me.data.id === s.owner?.id && s.status === "draft";
  const segment = location.pathname.split("/")[3] as StudyStepSegment | undefined;
  const step =
    segment && (STUDY_STEP_SEGMENTS as readonly string[]).includes(segment)
      ? steps.find((x) => x.key === segment)
      : undefined;
  const context: StudyOutletContext = { study: s, steps, canEdit, latestAnalysis };

  return (
    <div>
      <p className="text-sm">
        <Link to={paths.studies}>Studies</Link> <span className="text-ink-soft">/</span>
      </p>
      <div className="mb-4 mt-1 flex flex-wrap items-center gap-3">
        <h1 className="min-w-0 break-words text-3xl font-semibold text-spruce">{s.title}</h1>
        <ProgressBadge progress={s.progress} />
        {s.context !== "general" && (
          <span className="rounded-full bg-brick-100 px-2.5 py-0.5 text-xs font-semibold text-brick">
            {CONTEXT_LABELS[s.context]}
          </span>
        )}
        <PlanLockedNote plan={s.plan} />
        {!canEdit && <span className="text-sm text-ink-soft">Read-only</span>}
      </div>
      <ProgressBanner study={s} />
      <div className="grid gap-8 lg:grid-cols-[17rem_1fr]">
        <aside className="min-w-0 lg:sticky lg:top-4 lg:self-start">
          <Link to={`/studies/${s.id}`} className="mb-2 block px-2 text-sm">
            About this study
          </Link>
          <div className="rounded-lg bg-panel p-2">
            <StudyTrail studyId={s.id} steps={steps} />
          </div>
        </aside>
        <section className="min-w-0">
          {step?.state === "locked" ? (
            <div className="rounded-lg bg-paper p-6 shadow-sm">
              <h2 className="text-2xl font-semibold text-spruce">{step.label}</h2>
              <p className="mt-2">{step.fact}.</p>
            </div>
          ) : (
            <>
              {step && (
                <StepComments studyId={s.id} review={s.openReview} step={step.key} canReply={canEdit} />
              )}
              <Outlet context={context} />
            </>
          )}
        </section>
      </div>
    </div>
  );
}
