import { DesignQuestionnaire } from "@/features/studies/components/design-questionnaire";
import { StepHeading } from "@/components/ui/step-heading";
import { useStudyContext } from "./study-context";

export function StudyDesignRoute() {
  const { study, canEdit } = useStudyContext();
  return (
    <div>
      <StepHeading
        title="Design questions"
        intro="Five short questions about how the data were collected. They decide which tests fit, and are saved as you answer."
      />
      <DesignQuestionnaire study={study} readOnly={!canEdit} />
    </div>
  );
}
