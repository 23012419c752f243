import { formatAlpha } from "@/lib/format";
import { adjustmentTitle, comparisonName, policyTitle, posthocName, testTitle } from "@/lib/labels";
import type { StudyDto as Study } from "@waymark/contract";

/** What the plan will run, as the server derived it from the design answers and the policy. */
export function PlannedMethods({ study }: { study: Study }) {
  const p = study.plan;
  const tp = p.testPlan;
  return (
    <div className="flex flex-col gap-3">
      <section
        aria-labelledby="primary-test"
        className="rounded-lg border-l-4 border-spruce bg-paper p-4 text-sm shadow-sm"
      >
        <p className="text-xs font-semibold uppercase tracking-wider text-ink-soft">
          {p.lockedAt ? "Primary test, fixed when the plan was locked" : "Primary test your answers lead to"}
        </p>
        <h3 id="primary-test" className="text-lg font-semibold text-spruce" data-testid="primary-test">
          {tp.test === "out-of-scope" ? "None: the design is outside these tests" : testTitle(tp.test)}
        </h3>
        {tp.posthoc !== "none" && <p>Followed by {posthocName(tp.posthoc)}.</p>}
        <ul className="mt-2 list-disc space-y-1 pl-5">
          {tp.reasons.map((r) => (
            <li key={r.code}>{r.text}</li>
          ))}
        </ul>
        {!p.lockedAt && (
          <p className="mt-2 text-ink-soft">
            Locking the plan fixes this choice before any data are seen. Afterwards the checks on the data
            inform the reading and the sensitivity analyses; running another test is a deviation the reviewer
            sees.
          </p>
        )}
      </section>
      <dl
        className="grid gap-x-6 gap-y-2 rounded-lg bg-paper p-4 text-sm shadow-sm sm:grid-cols-[12rem_1fr]"
        aria-label="Planned methods"
      >
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
              {Math.round(p.power.targetPower * 100)}% power (achieved{" "}
              {Math.round(p.power.achievedPower * 100)}
              %)
            </span>
          ) : (
            <span className="text-ink-soft">Not planned yet — use the calculator below.</span>
          )}
          {p.power?.note && <span className="mt-1 block text-ink-soft">{p.power.note}</span>}
        </dd>
      </dl>
    </div>
  );
}
