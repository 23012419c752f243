import { Link } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { studyPath } from "@/config/paths";
import { useChecks } from "@/features/analyses/api/get-checks";
import { ChecksPanel } from "@/features/analyses/components/checks-panel";
import { StepHeading } from "@/components/ui/step-heading";
import { useStudyContext } from "./study-context";

export function StudyChecksRoute() {
  const { study } = useStudyContext();
  const ds = study.latestDataset;
  const checks = useChecks(study.id, ds?.id);
  return (
    <div>
      <StepHeading
        title="Checks"
        intro={`How data version ${ds?.version ?? "—"} stands against the assumptions of each test. Each check gives a plain reading, then the numbers.`}
      />
      {checks.isPending && <p className="text-ink-soft">Running the checks…</p>}
      {checks.error && <ErrorPanel title="The checks could not be run" message={checks.error.message} />}
      {checks.data && (
        <>
          <ChecksPanel study={study} data={checks.data} />
          <p className="mt-6">
            <Link
              to={studyPath(study.id, "choice")}
              className="inline-flex rounded-md bg-spruce px-4 py-2 text-sm font-semibold text-stone no-underline hover:bg-spruce-700 hover:no-underline"
            >
              See the plan's test for these data
            </Link>
          </p>
        </>
      )}
    </div>
  );
}
