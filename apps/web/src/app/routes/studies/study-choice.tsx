import { useNavigate } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { studyPath } from "@/config/paths";
import { useChecks } from "@/features/analyses/api/get-checks";
import { RecommendationCard } from "@/features/analyses/components/recommendation-card";
import { RunAnalysisForm } from "@/features/analyses/components/run-analysis-form";
import { TestChoiceStory } from "@/features/analyses/components/test-choice-story";
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
        intro="The locked plan names the primary test. The checks, the sensitivity analyses and the error-rate check below inform how to read it; running another test is a deviation from the plan that needs a written justification."
      />
      {checks.isPending && <p className="text-ink-soft">Loading the plan's test for these data…</p>}
      {checks.error && <ErrorPanel title="The checks could not be loaded" message={checks.error.message} />}
      {checks.data && !isAvailable(rec) && <UnavailableNote what="The plan's test" value={rec} />}
      {isAvailable(rec) && rec.test === "out-of-scope" && <OutOfScopeStop reason={rec.reasons[0]?.text} />}
      {isAvailable(rec) && rec.test !== "out-of-scope" && ds && checks.data && (
        <>
          <RecommendationCard rec={rec} />
          <TestChoiceStory result={checks.data.checks} />
          {latestAnalysis && latestAnalysis.datasetId === ds.id && (
            <p className="text-sm text-ink-soft">
              This data version was analysed with{" "}
              {latestAnalysis.chosenTest === rec.test
                ? "the plan's primary test"
                : "another test, as a deviation from the plan"}
              ; running again adds a new analysis.
            </p>
          )}
          {canEdit && (
            <RunAnalysisForm
              studyId={study.id}
              datasetId={ds.id}
              datasetVersion={ds.version}
              primary={rec.test}
              computable={rec.computable}
              onDone={() => navigate(studyPath(study.id, "results"))}
            />
          )}
        </>
      )}
    </div>
  );
}
