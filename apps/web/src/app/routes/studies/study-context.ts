import { useOutletContext } from "react-router-dom";
import type { StepStatus } from "@/features/studies/step-status";
import type { Analysis, Study } from "@/features/studies/types";

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
