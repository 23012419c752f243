import type { StudyStepSegment } from "@/config/paths";
import { formatDf, formatP, formatStat } from "@/lib/format";
import { formatDateTime } from "@/lib/format";
import { testTitle } from "@/lib/labels";
import { isAvailable, num } from "@/lib/result-values";
import type {
  AnalysisDto as Analysis,
  DesignQuestion as DesignKey,
  StudyDto as Study,
} from "@waymark/contract";
import type { Recommendation } from "@waymark/stats/result";

export type StepState = "done" | "open" | "locked";

export interface StepStatus {
  key: StudyStepSegment;
  label: string;
  state: StepState;
  /** The one fact that matters about this step right now. */
  fact: string;
  /** Shown in amber: an override, a study out of scope, data changed after the analysis. */
  attention?: boolean;
}

export const STEP_LABELS: Record<StudyStepSegment, string> = {
  design: "Design questions",
  plan: "Plan and sample size",
  data: "Data",
  checks: "Checks",
  choice: "Test choice",
  results: "Results",
};

export const DESIGN_KEYS: DesignKey[] = ["independence", "scale", "hasControl", "comparisons", "assignment"];

const short = (iso: string | null) => formatDateTime(iso);

/** A few words for why a test was recommended, from the engine's first reason. */
export function shortReason(rec: Pick<Recommendation, "test" | "reasons"> | null | undefined): string {
  if (!rec) return "as recommended";
  const first = (rec.reasons[0] ?? "").toLowerCase();
  if (rec.test === "kruskal-wallis") {
    if (first.includes("ordinal")) return "ordinal outcome";
    if (first.includes("outlier")) return "extreme outliers";
    if (first.includes("normal")) return "non-normal residuals";
    return "rank-based";
  }
  if (rec.test === "welch") {
    if (first.includes("policy")) return "Welch-first policy";
    return "unequal spread";
  }
  if (rec.test === "anova") return "similar spread";
  return "as recommended";
}

/** The omnibus result in reporting form, for the trail and sentences: "F(2, 27) = 4.21, p = .025". */
export function omnibusShort(analysis: Analysis): string | null {
  const r = analysis.result;
  if (analysis.chosenTest === "kruskal-wallis") {
    const kw = r.kruskalWallis;
    if (!isAvailable(kw) || num(kw.H) === null || num(kw.p) === null) return null;
    return `H(${formatDf(kw.df)}) = ${formatStat(kw.H)}, p ${formatP(kw.p)}`;
  }
  const part = analysis.chosenTest === "welch" ? r.welch : r.anova;
  if (!isAvailable(part) || num(part.F) === null || num(part.p) === null) return null;
  return `F(${formatDf(part.df1)}, ${formatDf(part.df2)}) = ${formatStat(part.F)}, p ${formatP(part.p)}`;
}

/**
 * Where a study stands on each step. A step is locked until the one before it allows it, open
 * while there is work to do, done when its record exists. Pure: the trail and the tests share it.
 * `analysis` is the latest analysis when it has been loaded (it only sharpens the facts).
 */
export function studySteps(study: Study, analysis?: Analysis | null): StepStatus[] {
  const answered = DESIGN_KEYS.filter((k) => study.design[k] !== undefined).length;
  const outOfScope = !!study.outOfScope;
  const designDone = study.designComplete && !outOfScope;
  const planLocked = !!study.plan.lockedAt;
  const dataset = study.latestDataset;
  const hasAnalysis = study.latestAnalysisId !== null;
  const analysisStale = !!(analysis && dataset && analysis.datasetId !== dataset.id);

  const design: StepStatus = outOfScope
    ? {
        key: "design",
        label: STEP_LABELS.design,
        state: "open",
        fact: "Out of scope: matched or repeated measurements",
        attention: true,
      }
    : designDone
      ? { key: "design", label: STEP_LABELS.design, state: "done", fact: designFact(study) }
      : {
          key: "design",
          label: STEP_LABELS.design,
          state: "open",
          fact: `${answered} of ${DESIGN_KEYS.length} answered`,
        };

  const plan: StepStatus = !designDone
    ? {
        key: "plan",
        label: STEP_LABELS.plan,
        state: planLocked ? "done" : "locked",
        fact: planLocked
          ? `Plan locked ${short(study.plan.lockedAt)}`
          : "Opens when the design questions are answered",
      }
    : planLocked
      ? {
          key: "plan",
          label: STEP_LABELS.plan,
          state: "done",
          fact: `Plan locked ${short(study.plan.lockedAt)}`,
        }
      : {
          key: "plan",
          label: STEP_LABELS.plan,
          state: "open",
          fact: study.plan.power
            ? `${testTitle(study.plan.plannedTest)}, n = ${study.plan.power.nPerGroup} per group, not locked`
            : `${testTitle(study.plan.plannedTest)} planned, not locked`,
        };

  const data: StepStatus = !planLocked
    ? { key: "data", label: STEP_LABELS.data, state: "locked", fact: "Opens when the plan is locked" }
    : dataset
      ? { key: "data", label: STEP_LABELS.data, state: "done", fact: dataFact(study) }
      : { key: "data", label: STEP_LABELS.data, state: "open", fact: "No data uploaded yet" };

  const checks: StepStatus =
    !planLocked || !dataset
      ? { key: "checks", label: STEP_LABELS.checks, state: "locked", fact: "Opens when data are uploaded" }
      : {
          key: "checks",
          label: STEP_LABELS.checks,
          state: hasAnalysis && !analysisStale ? "done" : "open",
          fact: `Checks on data version ${dataset.version}`,
        };

  let choice: StepStatus;
  if (!planLocked || !dataset)
    choice = {
      key: "choice",
      label: STEP_LABELS.choice,
      state: "locked",
      fact: "Opens when data are uploaded",
    };
  else if (!hasAnalysis)
    choice = {
      key: "choice",
      label: STEP_LABELS.choice,
      state: "open",
      fact: "Recommendation ready, not yet run",
    };
  else if (analysisStale)
    choice = {
      key: "choice",
      label: STEP_LABELS.choice,
      state: "open",
      fact: `New data version ${dataset.version} not yet analysed`,
      attention: true,
    };
  else if (analysis?.override)
    choice = {
      key: "choice",
      label: STEP_LABELS.choice,
      state: "done",
      fact: `${testTitle(analysis.chosenTest)}, override flagged for the reviewer`,
      attention: true,
    };
  else if (analysis)
    choice = {
      key: "choice",
      label: STEP_LABELS.choice,
      state: "done",
      fact: `${testTitle(analysis.chosenTest)}, reason: ${shortReason(isAvailable(analysis.result.recommendation) ? analysis.result.recommendation : null)}`,
    };
  else choice = { key: "choice", label: STEP_LABELS.choice, state: "done", fact: "Test chosen and run" };

  let results: StepStatus;
  if (!hasAnalysis)
    results = {
      key: "results",
      label: STEP_LABELS.results,
      state: "locked",
      fact: "Opens when the analysis has run",
    };
  else {
    const line = analysis ? omnibusShort(analysis) : null;
    results = {
      key: "results",
      label: STEP_LABELS.results,
      state: "done",
      fact: analysis
        ? `${line ?? testTitle(analysis.chosenTest)}${analysis.datasetVersion !== null ? ` (data v${analysis.datasetVersion})` : ""}`
        : "Analysis ready",
    };
  }

  return [design, plan, data, checks, choice, results];
}

function designFact(study: Study): string {
  const d = study.design;
  const parts = [
    d.scale === "ordinal" ? "ordinal outcome" : "continuous outcome",
    d.comparisons === "vs-control" ? `each vs ${study.controlLevel ?? "control"}` : "all pairs",
  ];
  return `Independent groups, ${parts.join(", ")}`;
}

function dataFact(study: Study): string {
  const ds = study.latestDataset;
  if (!ds) return "No data uploaded yet";
  const groups = ds.report.groupsFound;
  const n = groups.reduce((s, g) => s + g.n, 0);
  return `n = ${n} in ${groups.length} group${groups.length === 1 ? "" : "s"} (v${ds.version})`;
}

/** The first step with work to do, for "continue" links; the results once everything is done. */
export function currentStep(steps: StepStatus[]): StudyStepSegment {
  return (
    (
      steps.find((s) => s.state === "open") ??
      [...steps].reverse().find((s) => s.state === "done") ??
      steps[0]
    )?.key ?? "design"
  );
}
