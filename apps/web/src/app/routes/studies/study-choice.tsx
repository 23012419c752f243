import { useNavigate } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { studyPath } from "@/config/paths";
import { useChecks } from "@/features/analyses/api/get-checks";
import { RecommendationCard } from "@/features/analyses/components/recommendation-card";
import { RunAnalysisForm } from "@/features/analyses/components/run-analysis-form";
import { StepHeading } from "@/components/ui/step-heading";
import { OutOfScopeStop } from "@/features/studies/components/out-of-scope-stop";
import { UnavailableNote } from "@/features/analyses/components/unavailable-note";
import { isAvailable } from "@/lib/result-values";
import { useStudyContext } from "./study-context";

export function StudyChoiceRoute() {
  const { study, canEdit, latestAnalysis } = useStudyContext();
  const navigate = useNavigate();
  const ds = study.latestDataset;
  const checks = useChecks(study.id, ds?.id);
  const rec = checks.data?.checks.recommendation;
  return (
    <div className="flex flex-col gap-5">
      <StepHeading
        title="Test choice"
        intro="The test the plan and the checks point to, with the reasons. Another test can be chosen only with a written reason."
      />
      {checks.isPending && <p className="text-ink-soft">Loading the recommendation…</p>}
      {checks.error && (
        <ErrorPanel title="The recommendation could not be loaded" message={checks.error.message} />
      )}
      {checks.data && !isAvailable(rec) && <UnavailableNote what="The recommendation" value={rec} />}
      {isAvailable(rec) && rec.test === "out-of-scope" && <OutOfScopeStop reason={rec.reasons[0]} />}
      {isAvailable(rec) && rec.test !== "out-of-scope" && ds && (
        <>
          <RecommendationCard rec={rec} plannedTest={study.plan.plannedTest} />
          {latestAnalysis && latestAnalysis.datasetId === ds.id && (
            <p className="text-sm text-ink-soft">
              This data version was analysed with{" "}
              {latestAnalysis.chosenTest === rec.test ? "the recommended test" : "another test"}; running
              again adds a new analysis.
            </p>
          )}
          {canEdit && (
            <RunAnalysisForm
              studyId={study.id}
              datasetId={ds.id}
              datasetVersion={ds.version}
              recommended={rec.test}
              onDone={() => navigate(studyPath(study.id, "results"))}
            />
          )}
        </>
      )}
    </div>
  );
}
