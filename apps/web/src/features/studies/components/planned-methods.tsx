import { formatAlpha } from "@/lib/format";
import { ADJUST_NAMES, COMPARISON_TEXT, POLICY_TEXT, posthocName, testTitle } from "@/lib/labels";
import type { Study } from "../types";

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
      <dd className="font-semibold">{posthocName(p.plannedPosthoc)}</dd>
      <dt className="text-ink-soft">Comparisons</dt>
      <dd className="first-letter:uppercase">
        {COMPARISON_TEXT[p.comparisons] ?? p.comparisons}
        {p.comparisons === "vs-control" && study.controlLevel ? ` (${study.controlLevel})` : ""}
      </dd>
      <dt className="text-ink-soft">Policy</dt>
      <dd>{POLICY_TEXT[p.policy]?.title ?? p.policy}</dd>
      <dt className="text-ink-soft">p-value adjustment</dt>
      <dd>{ADJUST_NAMES[p.adjust] ?? p.adjust}</dd>
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
