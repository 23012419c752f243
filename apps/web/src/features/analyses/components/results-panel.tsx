import { formatAlpha, formatBounded, formatDateTime, formatPercent, formatStat } from "@/lib/format";
import { omnibusNumbers, etaSquaredWithCi } from "../omnibus";
import { posthocName, sentenceStart, testName, testTitle } from "@/lib/labels";
import { posthocView } from "../posthoc";
import { isAvailable, num } from "@/lib/result-values";
import type { AnalysisDto as Analysis, StudyDto as Study } from "@waymark/contract";
import { AttentionMark } from "@/components/ui/attention-mark";
import { CautionNote } from "./caution-note";
import { IntervalsPlot } from "./intervals-plot";
import { OmnibusLine } from "./omnibus-line";
import { PosthocTable } from "./posthoc-table";
import { SignificanceNote } from "./significance-note";
import { S } from "./stat-symbol";
import { UnavailableNote } from "./unavailable-note";
import { TestChoiceStory } from "./test-choice-story";
import { deviationSentence } from "@waymark/stats/result";

/** A sentence only when it carries no missing number. */
function clean(lines: unknown): string[] {
  if (!Array.isArray(lines)) return [];
  return lines.filter(
    (l): l is string =>
      typeof l === "string" && l.trim().length > 0 && !/\b(NaN|undefined|Infinity|null)\b/.test(l),
  );
}

/**
 * The results of one analysis: a plain summary first, then the omnibus test in reporting form
 * with its effect size, the post-hoc comparisons and their intervals, and the notes on reading them.
 */
export function ResultsPanel({ study, analysis }: { study: Study; analysis: Analysis }) {
  const r = analysis.result;
  const alpha = num(r.options?.alpha) ?? study.plan.alpha;
  const o = omnibusNumbers(analysis.chosenTest, r);
  const comparisons = r.options?.comparisons ?? study.plan.comparisons;
  const ph = posthocView(analysis.chosenTest, comparisons, r);
  const eta = analysis.chosenTest === "anova" ? etaSquaredWithCi(r) : null;
  const fwe = isAvailable(r.familyWiseError) ? r.familyWiseError : null;
  const summary = clean(analysis.summary);
  const outcome = study.outcomeName.toLowerCase();
  const significant = "unavailable" in o ? null : o.p < alpha;
  const assignedAtRandom = study.design.assignment === "randomized";

  const fallback =
    significant === null
      ? `${sentenceStart(testName(analysis.chosenTest))} could not be computed on these data.`
      : significant
        ? `${sentenceStart(testName(analysis.chosenTest))} finds a statistically significant difference in ${outcome} between the ${study.factorName.toLowerCase()} groups at α = ${formatAlpha(alpha)}${assignedAtRandom ? "" : "; as the groups were not assigned at random, read it as an association rather than an effect of the grouping"}.`
        : `${sentenceStart(testName(analysis.chosenTest))} does not find a statistically significant difference in ${outcome} between the ${study.factorName.toLowerCase()} groups at α = ${formatAlpha(alpha)}. That is not evidence that the groups are the same.`;

  return (
    <div className="flex flex-col gap-5" data-testid="results-panel">
      <p className="text-sm text-ink-soft">
        {analysis.datasetVersion !== null ? `Data version ${analysis.datasetVersion} · ` : ""}run{" "}
        {formatDateTime(analysis.createdAt)}
        {analysis.createdBy ? ` by ${analysis.createdBy.displayName}` : ""} · engine {analysis.engineVersion}
      </p>
      {analysis.deviation && (
        <p className="rounded-md border-l-4 border-amber bg-amber-100 p-3 text-sm" data-testid="deviation">
          <span className="font-semibold text-amber-800">Shown to the reviewer.</span>{" "}
          {deviationSentence(analysis.plannedTest, analysis.chosenTest, analysis.deviation.justification)}
        </p>
      )}

      <section aria-labelledby="summary-title" className="rounded-lg bg-paper p-5 shadow-sm">
        <h3 id="summary-title" className="font-semibold">
          In plain words
        </h3>
        <div className="mt-2 max-w-prose space-y-2" data-testid="plain-summary">
          {(summary.length > 0 ? summary : [fallback]).map((s) => (
            <p key={s}>{s}</p>
          ))}
        </div>
      </section>

      <section aria-labelledby="omnibus-title" className="rounded-lg bg-paper p-5 shadow-sm">
        <h3 id="omnibus-title" className="font-semibold">
          {testTitle(analysis.chosenTest)}
        </h3>
        {"unavailable" in o ? (
          <div className="mt-2">
            <UnavailableNote
              what={testTitle(analysis.chosenTest)}
              value={{ available: false, reason: o.unavailable }}
            />
          </div>
        ) : (
          <>
            <p className="mt-2 text-lg">
              <OmnibusLine o={o} />
              {significant ? (
                <span className="ml-2 text-sm font-medium text-spruce">below α = {formatAlpha(alpha)}</span>
              ) : (
                <span className="ml-2 text-sm text-ink-soft">not below α = {formatAlpha(alpha)}</span>
              )}
            </p>
            <ul className="mt-3 space-y-1 text-sm">
              {o.effect ? (
                <li>
                  Effect size: <S>{o.effect.symbol.charAt(0)}</S>
                  {o.effect.symbol.slice(1)} ={" "}
                  <span className="tabular-nums">{formatBounded(o.effect.value)}</span>
                  {o.effect.note ? ` (${o.effect.note})` : ""} — the share of the variation in {outcome} that
                  goes with the grouping
                  {o.effect.symbol === "ε²" ? ", on ranks" : ""}. As a rough guide, .01 is small, .06 medium
                  and .14 large.
                  {o.effect.value < 0 && " A value below zero means no detectable effect."}
                </li>
              ) : (
                <li className="text-ink-soft">No effect size could be computed for this test.</li>
              )}
              {eta && (
                <li>
                  <S>η</S>² = <span className="tabular-nums">{formatBounded(eta.value)}</span>,{" "}
                  {Math.round((eta.level ?? 0.95) * 100)}% CI{" "}
                  <span className="tabular-nums">
                    [{formatBounded(eta.lower)}, {formatBounded(eta.upper)}]
                  </span>
                </li>
              )}
              {"cohensF" in o && o.cohensF !== undefined && analysis.chosenTest !== "kruskal-wallis" && (
                <li>
                  Cohen's <S>f</S> = <span className="tabular-nums">{formatStat(o.cohensF)}</span>
                  {study.plan.power ? (
                    <span className="text-ink-soft">
                      {" "}
                      (the plan was sized for f = {formatStat(study.plan.power.effectF)})
                    </span>
                  ) : null}
                </li>
              )}
            </ul>
          </>
        )}
      </section>

      <TestChoiceStory result={r} />

      <section aria-labelledby="posthoc-title" className="rounded-lg bg-paper p-5 shadow-sm">
        <h3 id="posthoc-title" className="font-semibold">
          Which groups differ
        </h3>
        <p className="mt-1 text-sm text-ink-soft">
          {sentenceStart(posthocName(analysis.posthocMethod))}, holding the chance of any false alarm over the
          family at α = {formatAlpha(alpha)}.
          {fwe && num(fwe.m) !== null && num(fwe.fwerIndependent) !== null && (
            <>
              {" "}
              Without that protection, {fwe.m} comparisons would carry a {formatPercent(fwe.fwerIndependent)}{" "}
              chance of at least one.
            </>
          )}
        </p>
        {significant === false && (
          <p className="mt-2 text-sm">
            The omnibus test found no difference, so these comparisons are shown for completeness and should
            not be read as findings.
          </p>
        )}
        <div className="mt-3 flex flex-col gap-4">
          {"unavailable" in ph ? (
            <UnavailableNote
              what="The post-hoc comparisons"
              value={{ available: false, reason: ph.unavailable }}
            />
          ) : (
            <>
              <PosthocTable
                view={ph}
                methodName={posthocName(analysis.posthocMethod)}
                alpha={alpha}
                unit={study.outcomeUnit}
              />
              <IntervalsPlot
                rows={ph.rows}
                unit={study.outcomeUnit}
                level={1 - alpha}
                centre={ph.centreLabel}
              />
            </>
          )}
        </div>
      </section>

      {(r.warnings?.length ?? 0) > 0 && (
        <ul className="space-y-1 text-sm">
          {clean(r.warnings).map((w) => (
            <li key={w}>
              <AttentionMark label="note" /> {w}
            </li>
          ))}
        </ul>
      )}
      <SignificanceNote outcome={outcome} unit={study.outcomeUnit} />
      <CautionNote context={study.context} />
    </div>
  );
}
