import { useSearchParams } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { AnalysisRuns } from "@/features/analyses/components/analysis-runs";
import { DraftReportLink } from "@/features/reports/components/draft-report-link";
import { HistoryTimeline } from "@/features/reviews/components/history-timeline";
import { useAnalysis } from "@/features/analyses/api/get-analysis";
import { ResultsPanel } from "@/features/analyses/components/results-panel";
import { StepHeading } from "@/components/ui/step-heading";
import { SubmitPanel } from "@/features/reviews/components/submit-panel";
import { useStudyContext } from "./study-context";

export function StudyResultsRoute() {
  const { study, canEdit } = useStudyContext();
  // Each run has its own address (?analysis=ID); without one, the newest run is shown.
  const [params] = useSearchParams();
  const asked = Number(params.get("analysis"));
  const shownId = Number.isSafeInteger(asked) && asked > 0 ? asked : study.latestAnalysisId;
  const analysis = useAnalysis(study.id, shownId);
  const owner = canEdit || study.status !== "draft";
  return (
    <div className="flex flex-col gap-8">
      <div>
        <StepHeading
          title="Results"
          intro="What the test found, in words first and then in numbers, with the effect sizes beside the p-values."
        />
        {analysis.isPending && <p className="text-ink-soft">Loading the results…</p>}
        {analysis.error && (
          <ErrorPanel title="The results could not be loaded" message={analysis.error.message} />
        )}
        <div className="mb-4">
          <AnalysisRuns
            studyId={study.id}
            shownId={analysis.data?.id ?? null}
            activeDatasetId={study.activeDataset?.id ?? null}
          />
        </div>
        {analysis.data && <ResultsPanel study={study} analysis={analysis.data} />}
      </div>
      {analysis.data && owner && (
        <div className="flex flex-col gap-3">
          {(canEdit || study.status === "in_review" || study.status === "approved") && (
            <SubmitPanel study={study} analysisId={analysis.data.id} />
          )}
          <DraftReportLink studyId={study.id} />
        </div>
      )}
      <section aria-labelledby="history-title">
        <h3 id="history-title" className="mb-2 font-semibold">
          History
        </h3>
        <HistoryTimeline studyId={study.id} />
      </section>
    </div>
  );
}
