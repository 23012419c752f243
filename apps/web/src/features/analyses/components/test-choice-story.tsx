import { errorRateSentences, sensitivitySentences, type AnalysisResult } from "@waymark/stats/result";

/**
 * What the checks say about the plan's test, how the other tests compare (sensitivity
 * analyses) and how often each test would falsely find a difference with data like these —
 * the same sentences the report prints.
 */
export function TestChoiceStory({ result }: { result: AnalysisResult }) {
  const decision = result.recommendation;
  return (
    <div className="flex flex-col gap-4">
      {result.checkWarnings.length > 0 && (
        <section
          aria-labelledby="check-warnings"
          className="rounded-lg border-l-4 border-amber bg-paper p-4 shadow-sm"
        >
          <h4 id="check-warnings" className="text-sm font-semibold">
            What the checks say about it
          </h4>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm">
            {result.checkWarnings.map((w) => (
              <li key={`${w.code}-${String(w.params.group ?? "")}`}>{w.text}</li>
            ))}
          </ul>
        </section>
      )}
      <section
        aria-labelledby="error-rate"
        className="rounded-lg bg-paper p-4 shadow-sm"
        data-testid="error-rate-check"
      >
        <h4 id="error-rate" className="text-sm font-semibold">
          How often each test would find a difference that is not there
        </h4>
        <div className="mt-1 max-w-prose space-y-1 text-sm">
          {errorRateSentences(result.errorRateCheck, decision.test).map((line) => (
            <p key={line}>{line}</p>
          ))}
        </div>
      </section>
      <section
        aria-labelledby="sensitivity"
        className="rounded-lg bg-paper p-4 shadow-sm"
        data-testid="sensitivity"
      >
        <h4 id="sensitivity" className="text-sm font-semibold">
          Sensitivity analyses
        </h4>
        <div className="mt-1 max-w-prose space-y-1 text-sm">
          {sensitivitySentences(result.sensitivity).map((line) => (
            <p key={line}>{line}</p>
          ))}
        </div>
      </section>
    </div>
  );
}
