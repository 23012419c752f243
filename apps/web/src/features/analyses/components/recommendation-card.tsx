import { posthocName, testName, testTitle } from "@/lib/labels";
import type { Recommendation } from "@waymark/stats/result";

/** The recommended test, why, the alternatives and why not, and the matching post-hoc method. */
export function RecommendationCard({ rec, plannedTest }: { rec: Recommendation; plannedTest?: string }) {
  return (
    <section
      aria-labelledby="rec-title"
      className="rounded-lg border-l-4 border-spruce bg-paper p-5 shadow-sm"
    >
      <p className="text-xs font-semibold uppercase tracking-wider text-ink-soft">Recommended</p>
      <h3 id="rec-title" className="text-xl font-semibold text-spruce" data-testid="recommended-test">
        {testTitle(rec.test)}
      </h3>
      <p className="mt-1 text-sm">
        Followed by <span className="font-medium">{posthocName(rec.posthoc)}</span>.
        {plannedTest && plannedTest !== rec.test && (
          <span className="text-ink-soft">
            {" "}
            The plan expected {testName(plannedTest)}; the checks on these data point elsewhere.
          </span>
        )}
      </p>
      <h4 className="mt-4 text-sm font-semibold">Why</h4>
      <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
        {rec.reasons.map((r) => (
          <li key={r}>{r}</li>
        ))}
      </ul>
      {rec.caveats.length > 0 && (
        <>
          <h4 className="mt-4 text-sm font-semibold">Keep in mind</h4>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
            {rec.caveats.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </>
      )}
      {rec.alternatives.length > 0 && (
        <>
          <h4 className="mt-4 text-sm font-semibold">The other tests, and why not</h4>
          <dl className="mt-1 space-y-1 text-sm">
            {rec.alternatives.map((a) => (
              <div key={a.test}>
                <dt className="inline font-medium">{testTitle(a.test)}: </dt>
                <dd className="inline">{a.whyNot}</dd>
              </div>
            ))}
          </dl>
        </>
      )}
    </section>
  );
}
