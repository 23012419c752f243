import { useMutation, useQueryClient } from "@tanstack/react-query";
import { ApiError, uploadWithProgress } from "@/lib/api-client";
import {
  planMismatchDetails,
  type DatasetDto as Dataset,
  type Layout,
  type PlanMismatchDetails,
  type ValidationReport,
} from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export interface UploadDatasetInput {
  file: File;
  layout: Layout;
  groupColumn?: string;
  outcomeColumn?: string;
  /** Names in the file → the planned level each one means, or null to leave that group out. */
  levelMap?: Record<string, string | null>;
}

export function uploadDataset(
  id: number,
  input: UploadDatasetInput,
  onProgress?: (f: number) => void,
): Promise<Dataset> {
  const form = new FormData();
  form.append("file", input.file);
  form.append("layout", input.layout);
  if (input.layout === "long") {
    if (input.groupColumn) form.append("groupColumn", input.groupColumn);
    if (input.outcomeColumn) form.append("outcomeColumn", input.outcomeColumn);
  }
  if (input.levelMap && Object.keys(input.levelMap).length)
    form.append("levelMap", JSON.stringify(input.levelMap));
  return uploadWithProgress<{ dataset: Dataset }>(`/studies/${id}/datasets`, form, onProgress).then(
    (r) => r.dataset,
  );
}

/** The validation report a 422 carries: the file was read but not stored. */
export function rejectedReport(error: unknown): ValidationReport | null {
  if (!(error instanceof ApiError) || error.status !== 422) return null;
  const report = (error.details as { report?: ValidationReport } | undefined)?.report;
  return report && Array.isArray(report.groupsFound) ? report : null;
}

/** What a 422 `data_does_not_match_plan` lists: missing and unplanned groups, and the mappings offered. */
export function planMismatch(error: unknown): PlanMismatchDetails | null {
  if (!(error instanceof ApiError) || error.code !== "data_does_not_match_plan") return null;
  const parsed = planMismatchDetails.safeParse(error.details);
  return parsed.success ? parsed.data : null;
}

export function useUploadDataset(id: number, onProgress?: (f: number) => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadDatasetInput) => uploadDataset(id, input, onProgress),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: studyKeys.detail(id), exact: true });
      void qc.invalidateQueries({ queryKey: studyKeys.datasets(id) });
      void qc.invalidateQueries({ queryKey: studyKeys.all, exact: true });
    },
  });
}
