import { formatAlpha } from "@/lib/format";
import {
  adjustmentTitle,
  comparisonName,
  policyTitle,
  posthocName,
  sentenceStart,
  testTitle,
} from "@/lib/labels";
import type { StudyDto as Study } from "@waymark/contract";

/** What the plan will run, as the server derived it from the design answers and the policy. */
export function PlannedMethods({ study }: { study: Study }) {
  const p = study.plan;
  return (
    <dl
      className="grid gap-x-6 gap-y-2 rounded-lg bg-paper p-4 text-sm shadow-sm sm:grid-cols-[12rem_1fr]"
      aria-label="Planned methods"
    >
      <dt className="text-ink-soft">Planned test</dt>
      <dd className="font-semibold">{testTitle(p.plannedTest)}</dd>
      <dt className="text-ink-soft">Matched post-hoc method</dt>
      <dd className="font-semibold">{sentenceStart(posthocName(p.plannedPosthoc))}</dd>
      <dt className="text-ink-soft">Comparisons</dt>
      <dd className="first-letter:uppercase">
        {comparisonName(p.comparisons)}
        {p.comparisons === "vs-control" && study.controlLevel ? ` (${study.controlLevel})` : ""}
      </dd>
      <dt className="text-ink-soft">Policy</dt>
      <dd>{policyTitle(p.policy)}</dd>
      <dt className="text-ink-soft">p-value adjustment</dt>
      <dd>{adjustmentTitle(p.adjust)}</dd>
      <dt className="text-ink-soft">Significance level</dt>
      <dd className="tabular-nums">α = {formatAlpha(p.alpha)}</dd>
      <dt className="text-ink-soft">Sample size</dt>
      <dd>
        {p.power ? (
          <span className="tabular-nums">
            n = {p.power.nPerGroup} per group for f = {p.power.effectF.toFixed(2)} at{" "}
            {Math.round(p.power.targetPower * 100)}% power (achieved {Math.round(p.power.achievedPower * 100)}
            %)
          </span>
        ) : (
          <span className="text-ink-soft">Not planned yet — use the calculator below.</span>
        )}
      </dd>
    </dl>
  );
}
