import type { QueryClient } from "@tanstack/react-query";
import type { StudyDto as Study } from "@waymark/contract";
import { studyKeys } from "./query-keys";

/** After a mutation answers with the study: update its detail and refresh the list. */
export function storeStudy(qc: QueryClient, study: Study) {
  qc.setQueryData(studyKeys.detail(study.id), study);
  void qc.invalidateQueries({ queryKey: studyKeys.all, exact: true });
}
