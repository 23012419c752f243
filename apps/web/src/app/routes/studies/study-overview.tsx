import { StudyOverview } from "@/features/studies/components/study-overview";
import { useStudyContext } from "./study-context";

export function StudyOverviewRoute() {
  const { study, steps } = useStudyContext();
  return <StudyOverview study={study} steps={steps} />;
}
