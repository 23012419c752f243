import { Lock } from "lucide-react";
import { formatDateTime } from "@/lib/format";
import type { PlanDto as Plan } from "@waymark/contract";

/** "Plan locked <date time>", shown on every step once the plan is fixed. */
export function PlanLockedNote({ plan }: { plan: Plan }) {
  if (!plan.lockedAt) return null;
  return (
    <p
      className="inline-flex items-center gap-1.5 rounded-md bg-spruce-100 px-2.5 py-1 text-sm font-medium text-spruce"
      data-testid="plan-locked-note"
    >
      <Lock aria-hidden="true" className="h-3.5 w-3.5" />
      Plan locked {formatDateTime(plan.lockedAt)}
      {plan.lockedBy ? (
        <span className="font-normal text-ink-soft">by {plan.lockedBy.displayName}</span>
      ) : null}
    </p>
  );
}
