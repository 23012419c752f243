import { posthocName, testTitle } from "@/lib/labels";
import { primaryTestSentence, type TestDecision } from "@waymark/stats/result";

/** The plan's primary test for these data: why, whether the plan's own rule applied, and whether it can run. */
export function RecommendationCard({ rec }: { rec: TestDecision }) {
  const blocked = rec.test !== "out-of-scope" && !rec.computable;
  return (
    <section
      aria-labelledby="rec-title"
      className={`rounded-lg border-l-4 bg-paper p-5 shadow-sm ${blocked ? "border-brick" : "border-spruce"}`}
    >
      <p className="text-xs font-semibold uppercase tracking-wider text-ink-soft">
        Primary test from the locked plan
      </p>
      <h3 id="rec-title" className="text-xl font-semibold text-spruce" data-testid="recommended-test">
        {rec.test === "out-of-scope" ? "Outside these tests" : testTitle(rec.test)}
      </h3>
      {rec.posthoc !== "none" && (
        <p className="mt-1 text-sm">
          Followed by <span className="font-medium">{posthocName(rec.posthoc)}</span>.
        </p>
      )}
      {(rec.ruleApplied || blocked) && <p className="mt-2 text-sm">{primaryTestSentence(rec)}</p>}
      <h4 className="mt-4 text-sm font-semibold">Why</h4>
      <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
        {rec.reasons.map((r) => (
          <li key={r.code}>{r.text}</li>
        ))}
      </ul>
      {rec.caveats.length > 0 && (
        <>
          <h4 className="mt-4 text-sm font-semibold">Keep in mind</h4>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
            {rec.caveats.map((c) => (
              <li key={c.code}>{c.text}</li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
