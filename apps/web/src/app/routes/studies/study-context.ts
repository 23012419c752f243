import { useOutletContext } from "react-router-dom";
import type { StepStatus } from "@/features/studies/step-status";
import type { AnalysisDto as Analysis, StudyDto as Study } from "@waymark/contract";

export interface StudyOutletContext {
  study: Study;
  steps: StepStatus[];
  /** The signed-in analyst owns this draft study and may change it. */
  canEdit: boolean;
  latestAnalysis: Analysis | null;
}

export function useStudyContext() {
  return useOutletContext<StudyOutletContext>();
}
