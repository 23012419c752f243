import { AttentionMarker } from "@/components/ui/attention-marker";
import { formatDateTime } from "@/lib/format";
import { posthocName, sentenceStart, testName, testTitle } from "@/lib/labels";
import type { AnalysisDto as ReviewAnalysis } from "@waymark/contract";

/** The plan's primary test against the one run; a deviation from the plan and its justification stand out. */
export function ChoiceFacts({ analysis }: { analysis: ReviewAnalysis }) {
  const overridden = !!analysis.deviation || analysis.plannedTest !== analysis.chosenTest;
  return (
    <div className="flex flex-col gap-3" data-testid="choice-facts">
      {overridden && (
        <div className="rounded-md border-2 border-amber bg-amber-100 p-4" data-testid="override-callout">
          <p className="flex flex-wrap items-center gap-2">
            <AttentionMarker>Deviation from the plan</AttentionMarker>
            <span className="font-semibold">
              The analyst ran {testName(analysis.chosenTest)} instead of the plan's primary test,{" "}
              {testName(analysis.plannedTest)}.
            </span>
          </p>
          {analysis.deviation?.justification ? (
            <blockquote className="mt-2 border-l-2 border-amber-800/40 pl-3 text-sm whitespace-pre-wrap">
              {analysis.deviation.justification}
            </blockquote>
          ) : (
            <p className="mt-2 text-sm">No justification was recorded.</p>
          )}
        </div>
      )}
      <dl className="grid gap-x-4 gap-y-1.5 text-sm sm:grid-cols-[12rem_1fr]">
        <dt className="text-ink-soft">Plan's primary test</dt>
        <dd>{testTitle(analysis.plannedTest)}</dd>
        <dt className="text-ink-soft">Run</dt>
        <dd className="font-medium">
          {testTitle(analysis.chosenTest)}
          {!overridden && <span className="font-normal text-ink-soft"> (as planned)</span>}
        </dd>
        <dt className="text-ink-soft">Post-hoc</dt>
        <dd>{sentenceStart(posthocName(analysis.posthocMethod))}</dd>
        <dt className="text-ink-soft">Run on</dt>
        <dd>
          <span className="num">{formatDateTime(analysis.createdAt)}</span>
          {analysis.createdBy ? ` by ${analysis.createdBy.displayName}` : ""} · engine{" "}
          {analysis.engineVersion}
          {analysis.datasetVersion !== null ? ` · data version ${analysis.datasetVersion}` : ""}
        </dd>
      </dl>
    </div>
  );
}
