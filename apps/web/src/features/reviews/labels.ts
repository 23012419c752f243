import type { ReviewStep } from "@waymark/contract";

export const STEP_LABELS: Record<ReviewStep, string> = {
  design: "Design",
  plan: "Plan",
  data: "Data",
  checks: "Checks",
  choice: "Test choice",
  results: "Results",
};

/** "1 day", "3 days"; "—" for anything that is not a whole, non-negative number. */
export function daysLabel(days: number): string {
  if (!Number.isFinite(days) || days < 0) return "—";
  const d = Math.floor(days);
  return d === 1 ? "1 day" : `${d} days`;
}
