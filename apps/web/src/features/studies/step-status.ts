import type { StudyStepSegment } from "@/config/paths";
import { formatDf, formatP, formatStat } from "@/lib/format";
import { formatDateTime } from "@/lib/format";
import { testTitle } from "@/lib/labels";
import { isAvailable, num } from "@/lib/result-values";
import {
  DESIGN_QUESTIONS,
  type AnalysisDto as Analysis,
  type StudyDto as Study,
  type StudyProgress,
} from "@waymark/contract";

export type StepState = "done" | "open" | "locked";

export interface StepStatus {
  key: StudyStepSegment;
  label: string;
  state: StepState;
  /** The one fact that matters about this step right now. */
  fact: string;
  /** Shown in amber: a deviation from the plan, a study out of scope, data not yet analysed. */
  attention?: boolean;
  /** The step the server's status names as the next one (`study.progress.nextStep.where`). */
  next?: boolean;
}

export const STEP_LABELS: Record<StudyStepSegment, string> = {
  design: "Design questions",
  plan: "Plan and sample size",
  data: "Data",
  checks: "Checks",
  choice: "Test choice",
  results: "Results",
};

export const DESIGN_KEYS = DESIGN_QUESTIONS;

const short = (iso: string | null) => formatDateTime(iso);

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
 * The step of the trail the server's next step points at. "review" and "report" happen outside
 * the study's steps, so they point at the results, where the analysis they concern is.
 */
export function progressStep(progress: StudyProgress): StudyStepSegment {
  const where = progress.nextStep.where;
  return where === "review" || where === "report" ? "results" : where;
}

/** The version analyses and submissions use: the one made active, else the newest upload. */
export const activeVersion = (study: Study) => study.activeDataset ?? study.latestDataset;

/**
 * Where a study stands on each step of its trail. A step is locked until the one before it
 * allows it, open while there is work to do, done when its record exists; the study's status
 * itself (its label and sentence) is the server's `study.progress`, and the step it names as
 * next is marked. Pure: the trail and the tests share it. `analysis` is the latest analysis
 * when it has been loaded (it only sharpens the facts).
 */
export function studySteps(study: Study, analysis?: Analysis | null): StepStatus[] {
  const answered = DESIGN_KEYS.filter((k) => study.design[k] !== undefined).length;
  const outOfScope = !!study.outOfScope;
  const designDone = study.designComplete && !outOfScope;
  const planLocked = !!study.plan.lockedAt;
  const dataset = activeVersion(study);
  const hasAnalysis = study.latestAnalysisId !== null;
  // The server's status says whether the active version still waits for its analysis.
  const notAnalysed =
    study.progress.state === "awaiting-analysis" ||
    (study.progress.state === "changes-requested" && study.progress.nextStep.where === "choice");

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

  const plan: StepStatus = planLocked
    ? {
        key: "plan",
        label: STEP_LABELS.plan,
        state: "done",
        fact: `Plan locked ${short(study.plan.lockedAt)}`,
      }
    : !designDone
      ? {
          key: "plan",
          label: STEP_LABELS.plan,
          state: "locked",
          fact: "Opens when the design questions are answered",
        }
      : {
          key: "plan",
          label: STEP_LABELS.plan,
          state: "open",
          fact:
            study.plan.plannedTest === "out-of-scope"
              ? "Not locked"
              : study.plan.power
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
          state: hasAnalysis && !notAnalysed ? "done" : "open",
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
  else if (!hasAnalysis || notAnalysed)
    choice = {
      key: "choice",
      label: STEP_LABELS.choice,
      state: "open",
      fact: `Data version ${dataset.version} not yet analysed`,
      attention: hasAnalysis,
    };
  else if (analysis?.deviation)
    choice = {
      key: "choice",
      label: STEP_LABELS.choice,
      state: "done",
      fact: `${testTitle(analysis.chosenTest)}, a deviation from the plan, shown to the reviewer`,
      attention: true,
    };
  else if (analysis)
    choice = {
      key: "choice",
      label: STEP_LABELS.choice,
      state: "done",
      fact: `${testTitle(analysis.chosenTest)}, as planned`,
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

  const steps = [design, plan, data, checks, choice, results];
  const next = progressStep(study.progress);
  return study.status === "draft" ? steps.map((s) => (s.key === next ? { ...s, next: true } : s)) : steps;
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
  const ds = activeVersion(study);
  if (!ds) return "No data uploaded yet";
  const groups = ds.report.groupsFound;
  const n = groups.reduce((s, g) => s + g.n, 0);
  return `n = ${n} in ${groups.length} group${groups.length === 1 ? "" : "s"} (v${ds.version}, active)`;
}

/** Where "continue" leads: the step the server's status names as next. */
export function currentStep(steps: StepStatus[]): StudyStepSegment {
  return (
    (
      steps.find((s) => s.next) ??
      steps.find((s) => s.state === "open") ??
      [...steps].reverse().find((s) => s.state === "done") ??
      steps[0]
    )?.key ?? "design"
  );
}
