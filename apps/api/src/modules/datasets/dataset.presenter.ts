import type { Study } from "../studies/study.entity.js";
import type { Dataset } from "./dataset.entity.js";

export function presentDataset(d: Dataset, study: Pick<Study, "planLockedAt">) {
  return {
    id: d.id,
    studyId: d.studyId,
    version: d.version,
    fileName: d.fileName,
    sizeBytes: d.sizeBytes,
    sha256: d.sha256,
    mediaType: d.mediaType,
    uploadedAt: d.uploadedAt,
    uploadedBy: d.uploadedBy ? { id: d.uploadedBy.id, displayName: d.uploadedBy.displayName } : null,
    layout: d.layout,
    groupColumn: d.groupColumn,
    outcomeColumn: d.outcomeColumn,
    // Reviewers check that data arrived only after the analysis was pre-specified.
    afterPlanLock:
      !!study.planLockedAt && new Date(d.uploadedAt).getTime() >= new Date(study.planLockedAt).getTime(),
    report: d.report,
  };
}
