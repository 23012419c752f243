import { FamilyWisePanel } from "@/features/studies/components/family-wise-panel";
import { LockPlanPanel } from "@/features/studies/components/lock-plan-panel";
import { PlanForm } from "@/features/studies/components/plan-form";
import { PlannedMethods } from "@/features/studies/components/planned-methods";
import { PowerCalculator } from "@/features/power/components/power-calculator";
import { useSavePlan } from "@/features/studies/api/save-plan";
import { StepHeading } from "@/components/ui/step-heading";
import { useStudyContext } from "./study-context";

export function StudyPlanRoute() {
  const { study, canEdit } = useStudyContext();
  const locked = !!study.plan.lockedAt;
  const editable = canEdit && !locked;
  const savePlan = useSavePlan(study.id);
  return (
    <div className="flex flex-col gap-6">
      <StepHeading
        title="Plan and sample size"
        intro={
          locked
            ? "The plan is locked: these are the rules the analysis follows."
            : "Fix the rules of the analysis before seeing the data: the test policy, the comparisons, α and the sample size."
        }
      />
      <PlannedMethods study={study} />
      {editable && (
        <section aria-labelledby="plan-rules" className="rounded-lg bg-paper p-5 shadow-sm">
          <h3 id="plan-rules" className="mb-3 font-semibold">
            Rules of the analysis
          </h3>
          <PlanForm study={study} />
        </section>
      )}
      <PowerCalculator study={study} editable={editable} save={savePlan} />
      <FamilyWisePanel
        k={study.levels.length}
        alpha={study.plan.alpha}
        comparisons={study.plan.comparisons}
      />
      {editable && <LockPlanPanel study={study} />}
    </div>
  );
}
