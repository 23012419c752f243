import { Link, useParams } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { paths, reportPath, studyPath } from "@/config/paths";
import { useMe } from "@/lib/current-user";
import { useStudyHistory } from "@/features/reviews/api/get-study-history";
import { CheckReadings } from "@/features/reviews/components/check-readings";
import { ChoiceFacts } from "@/features/reviews/components/choice-facts";
import { DecisionPanel } from "@/features/reviews/components/decision-panel";
import { HistoryTimeline } from "@/features/reviews/components/history-timeline";
import { DataFacts, PlanFacts } from "@/features/reviews/components/plan-facts";
import { ReviewSection, ReviewStepIndex } from "@/features/reviews/components/review-section";
import { useAnalysis } from "@/features/analyses/api/get-analysis";
import { useChecks } from "@/features/analyses/api/get-checks";
import { useStudy } from "@/features/studies/api/get-study";
import { DesignSummary } from "@/features/studies/components/design-summary";
import { ProgressBadge } from "@/features/studies/components/progress-badge";
import { RoundChangesPanel } from "@/features/reviews/components/round-changes-panel";
import { RecommendationCard } from "@/features/analyses/components/recommendation-card";
import { ResultsPanel } from "@/features/analyses/components/results-panel";
import { isAvailable } from "@/lib/result-values";
import { formatDateTime } from "@/lib/format";

/**
 * The review page: the study's whole trail, read-only, with overrides and failed checks marked,
 * and the decision at its end. The analysis shown is the one frozen in the open review round.
 */
export function ReviewStudyRoute() {
  const { studyId } = useParams();
  const id = Number(studyId);
  const valid = Number.isInteger(id) && id > 0;
  const me = useMe();
  const study = useStudy(valid ? id : 0);
  const history = useStudyHistory(valid ? id : 0);
  const round = history.data?.rounds.at(-1);
  const analysisId = round?.analysisId ?? study.data?.latestAnalysisId ?? null;
  const analysis = useAnalysis(id, history.isPending ? null : analysisId);
  const datasetId = analysis.data?.datasetId ?? round?.datasetId ?? null;
  const checks = useChecks(id, datasetId);

  if (!valid) return <ErrorPanel title="No such study" message="The address does not name a study." />;
  if (study.isPending) return <p className="text-ink-soft">Loading the study…</p>;
  if (study.error) return <ErrorPanel title="The study could not be loaded" message={study.error.message} />;
  const s = study.data;
  const a = analysis.data ?? null;
  const readings = checks.data?.readings ?? [];
  const attention = readings.filter((r) => r.level === "attention").length;
  const overridden = !!a && (!!a.deviation || a.plannedTest !== a.chosenTest);
  const rec = a && isAvailable(a.result.recommendation) ? a.result.recommendation : null;

  const active = s.activeDataset ?? s.latestDataset;
  const steps = [
    { id: "design", title: "Design" },
    { id: "plan", title: "Plan", flag: s.plan.lockedAt ? undefined : "Not locked" },
    {
      id: "data",
      title: "Data",
      flag: active && !active.afterPlanLock ? "Before plan lock" : undefined,
    },
    { id: "checks", title: "Checks", flag: attention ? `${attention} to look at` : undefined },
    { id: "choice", title: "Test choice", flag: overridden ? "Deviation" : undefined },
    { id: "results", title: "Results" },
    { id: "history", title: "History" },
    { id: "decision", title: s.status === "in_review" ? "Your decision" : "Decision" },
  ];

  return (
    <div>
      <p className="text-sm">
        <Link to={paths.reviews}>Review queue</Link> <span className="text-ink-soft">/</span>
      </p>
      <header className="mb-6 mt-1">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="min-w-0 break-words text-3xl font-semibold text-spruce">{s.title}</h1>
          <ProgressBadge progress={s.progress} />
          <span className="text-sm text-ink-soft">Read-only</span>
        </div>
        <p className="mt-1 text-sm text-ink-soft">
          {s.owner ? `Analyst: ${s.owner.displayName}` : ""}
          {round ? ` · round ${round.round} submitted ${formatDateTime(round.submittedAt)}` : ""}
          {" · "}
          <Link to={studyPath(s.id)}>Open the study's own pages</Link>
          {s.status === "approved" && (
            <>
              {" · "}
              <Link to={reportPath(s.id)}>Read the report</Link>
            </>
          )}
        </p>
      </header>

      <RoundChangesPanel round={round} />
      <div className="grid gap-6 lg:grid-cols-[1fr_16rem]">
        <div className="flex min-w-0 flex-col gap-5">
          <ReviewSection id="design" number={1} title="Design">
            <p className="mb-3 text-sm">
              {s.outcomeName} compared across {s.levels.length} groups of {s.factorName.toLowerCase()}:{" "}
              {s.levels.join(", ")}.
            </p>
            <DesignSummary study={s} />
          </ReviewSection>
          <ReviewSection id="plan" number={2} title="Plan" flag={steps[1]!.flag}>
            <PlanFacts study={s} />
          </ReviewSection>
          <ReviewSection id="data" number={3} title="Data" flag={steps[2]!.flag}>
            <DataFacts study={s} analysis={a} />
          </ReviewSection>
          <ReviewSection id="checks" number={4} title="Assumption checks" flag={steps[3]!.flag}>
            {checks.isPending && datasetId ? (
              <p className="text-sm text-ink-soft">Loading the checks…</p>
            ) : null}
            {checks.error && (
              <ErrorPanel title="The checks could not be loaded" message={checks.error.message} />
            )}
            {checks.data && <CheckReadings readings={readings} />}
            {!datasetId && <p className="text-sm text-ink-soft">There are no data to check.</p>}
            <p className="mt-3 text-sm">
              <Link to={studyPath(s.id, "checks")}>See every check with its numbers</Link>
            </p>
          </ReviewSection>
          <ReviewSection id="choice" number={5} title="Test choice" flag={steps[4]!.flag}>
            {analysis.isPending && analysisId ? (
              <p className="text-sm text-ink-soft">Loading the analysis…</p>
            ) : null}
            {analysis.error && (
              <ErrorPanel title="The analysis could not be loaded" message={analysis.error.message} />
            )}
            {!analysisId && <p className="text-sm text-ink-soft">No analysis has been run.</p>}
            {a && (
              <div className="flex flex-col gap-4">
                <ChoiceFacts analysis={a} />
                {rec && <RecommendationCard rec={rec} />}
              </div>
            )}
          </ReviewSection>
          <ReviewSection id="results" number={6} title="Results">
            {a ? (
              <ResultsPanel study={s} analysis={a} />
            ) : (
              <p className="text-sm text-ink-soft">No results yet.</p>
            )}
          </ReviewSection>
          <ReviewSection id="history" number={7} title="History">
            <HistoryTimeline studyId={s.id} />
          </ReviewSection>
          <div id="decision" className="scroll-mt-4">
            {me.data && <DecisionPanel study={s} history={history.data} me={me.data} />}
          </div>
        </div>
        <aside className="flex flex-col gap-3 lg:sticky lg:top-4 lg:self-start">
          <ReviewStepIndex steps={steps} />
          {s.status === "in_review" && (
            <a
              href="#decision"
              className="inline-flex items-center justify-center rounded-md bg-spruce px-4 py-2 text-sm font-semibold text-stone no-underline hover:bg-spruce-700 hover:no-underline"
            >
              Go to your decision
            </a>
          )}
        </aside>
      </div>
    </div>
  );
}
