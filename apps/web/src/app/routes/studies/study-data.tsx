import { ErrorPanel } from "@/components/errors/error-panel";
import { useDatasets } from "@/features/datasets/api/get-datasets";
import { DataUpload } from "@/features/datasets/components/data-upload";
import { DatasetVersions } from "@/features/datasets/components/dataset-versions";
import { StepHeading } from "@/components/ui/step-heading";
import { ValidationReport } from "@/features/datasets/components/validation-report";
import { useStudyContext } from "./study-context";

export function StudyDataRoute() {
  const { study, canEdit } = useStudyContext();
  const datasets = useDatasets(study.id);
  const active = study.activeDataset ?? study.latestDataset;
  return (
    <div className="flex flex-col gap-6">
      <StepHeading
        title="Data"
        intro="Upload the measurements as CSV or XLSX. Every upload is kept as a new version with its fingerprint and becomes the active one, the version analyses and the submission use; an earlier version can be made active again."
      />
      {canEdit && <DataUpload study={study} />}
      {active && (
        <div>
          <h3 className="mb-2 font-semibold">Active version (v{active.version})</h3>
          <ValidationReport report={active.report} levels={study.levels} stored />
        </div>
      )}
      <section aria-labelledby="versions-title">
        <h3 id="versions-title" className="mb-2 font-semibold">
          Versions
        </h3>
        {datasets.error && (
          <ErrorPanel title="The versions could not be loaded" message={datasets.error.message} />
        )}
        {datasets.data && (
          <DatasetVersions studyId={study.id} datasets={datasets.data} canActivate={canEdit} />
        )}
      </section>
    </div>
  );
}
