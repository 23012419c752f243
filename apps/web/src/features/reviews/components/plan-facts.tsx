import { AttentionMarker } from "@/components/ui/attention-marker";
import { formatAlpha, formatBounded, formatDateTime, formatStat } from "@/lib/format";
import { adjustmentTitle, policyTitle, posthocName, sentenceStart, testTitle } from "@/lib/labels";
import type { AnalysisDto as ReviewAnalysis, StudyDto as ReviewStudy } from "@waymark/contract";
import { ShortHash } from "@/components/ui/short-hash";

function Row({ term, children }: { term: string; children: React.ReactNode }) {
  return (
    <div className="grid gap-x-4 py-1.5 sm:grid-cols-[12rem_1fr]">
      <dt className="text-sm text-ink-soft">{term}</dt>
      <dd className="text-sm">{children}</dd>
    </div>
  );
}

/** The pre-specified plan as it was locked: policy, α, adjustment, planned tests, power, lock time. */
export function PlanFacts({ study }: { study: ReviewStudy }) {
  const p = study.plan;
  return (
    <dl className="divide-y divide-ink/10" aria-label="Analysis plan">
      <Row term="Locked">
        {p.lockedAt ? (
          <span>
            <span className="num">{formatDateTime(p.lockedAt)}</span>
            {p.lockedBy ? ` by ${p.lockedBy.displayName}` : ""}
          </span>
        ) : (
          <AttentionMarker>The plan is not locked</AttentionMarker>
        )}
      </Row>
      <Row term="Test policy">{policyTitle(p.policy)}</Row>
      <Row term="Planned test">{testTitle(p.plannedTest)}</Row>
      <Row term="Planned post-hoc">{sentenceStart(posthocName(p.plannedPosthoc))}</Row>
      <Row term="Significance level">
        <span className="num">α = {formatAlpha(p.alpha)}</span>
      </Row>
      <Row term="Adjustment">{adjustmentTitle(p.adjust)}</Row>
      <Row term="Sample size plan">
        {p.power ? (
          <span>
            <span className="num">{p.power.nPerGroup}</span> per group for{" "}
            <span className="num">f = {formatStat(p.power.effectF)}</span> at a target power of{" "}
            <span className="num">{formatBounded(p.power.targetPower)}</span> (achieved{" "}
            <span className="num">{formatBounded(p.power.achievedPower)}</span>)
          </span>
        ) : (
          <span className="text-ink-soft">No power calculation was stored with the plan.</span>
        )}
      </Row>
    </dl>
  );
}

/**
 * The data the analysis in review used: the active version (the server refuses a submission on
 * any other). A newer upload that was set aside by making an earlier version active is named.
 */
export function DataFacts({ study, analysis }: { study: ReviewStudy; analysis: ReviewAnalysis | null }) {
  const d = study.activeDataset ?? study.latestDataset;
  if (!d) return <p className="text-sm text-ink-soft">No data have been uploaded.</p>;
  const notActive = analysis && analysis.datasetId !== d.id;
  const newer = study.latestDataset && study.latestDataset.id !== d.id ? study.latestDataset : null;
  return (
    <dl className="divide-y divide-ink/10" aria-label="Data">
      <Row term="File">
        {d.fileName} <span className="text-ink-soft">· version {d.version}, the active version</span>
      </Row>
      <Row term="Uploaded">
        <span className="num">{formatDateTime(d.uploadedAt)}</span>
      </Row>
      <Row term="Against the plan">
        {d.afterPlanLock ? (
          <span>After the plan was locked, as it should be.</span>
        ) : (
          <span className="flex flex-wrap items-center gap-2">
            <AttentionMarker>Before the plan was locked</AttentionMarker>
            <span>The plan may have been written with these data in view.</span>
          </span>
        )}
      </Row>
      <Row term="SHA-256">
        <ShortHash hash={d.sha256} label="SHA-256 of the data file" />
      </Row>
      {newer && (
        <Row term="Later uploads">
          Version {newer.version} was uploaded later; the analyst made version {d.version} the active one
          again.
        </Row>
      )}
      {notActive && (
        <Row term="Analysed version">
          <AttentionMarker>
            {analysis.datasetVersion !== null ? `Version ${analysis.datasetVersion}` : "Another version"}
          </AttentionMarker>{" "}
          The analysis shown used another version than the active one.
        </Row>
      )}
    </dl>
  );
}
