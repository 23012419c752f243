import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { DatasetDto as Dataset } from "@waymark/contract";
import { studyKeys } from "@/lib/query-keys";

export function activateDataset(studyId: number, datasetId: number): Promise<Dataset> {
  return api
    .post<{ dataset: Dataset }>(`/studies/${studyId}/datasets/${datasetId}/activate`, {})
    .then((r) => r.dataset);
}

/** Makes a version the active one again: the study's status, its versions and the list change. */
export function useActivateDataset(studyId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (datasetId: number) => activateDataset(studyId, datasetId),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: studyKeys.detail(studyId), exact: true });
      void qc.invalidateQueries({ queryKey: studyKeys.datasets(studyId) });
      void qc.invalidateQueries({ queryKey: studyKeys.all, exact: true });
    },
  });
}
