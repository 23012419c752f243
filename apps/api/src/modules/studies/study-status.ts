/**
 * A study's one status: where it stands and who does what next, computed from its records.
 * Every list, page, queue, e-mail and report reads this answer, so no two places can
 * disagree. Pure: records in, status out.
 */

export type StudyState =
  | "out-of-scope"
  | "design-open"
  | "plan-open"
  | "awaiting-data"
  | "awaiting-analysis"
  | "ready-to-submit"
  | "changes-requested"
  | "in-review"
  | "approved";

export type NextStepWho = "analyst" | "reviewer" | "writer";
export type NextStepWhere = "design" | "plan" | "data" | "choice" | "results" | "review" | "report";

export interface StudyStatusRecords {
  status: "draft" | "in_review" | "approved";
  outOfScope: string | null;
  designComplete: boolean;
  planLocked: boolean;
  /** the version analyses and submissions must use; null before any upload */
  activeDataset: { id: number; version: number } | null;
  /** the newest analysis of the active version, if any */
  analysisOnActive: { id: number } | null;
  /** the newest analysis of any version (to tell "new data not yet analysed" apart) */
  latestAnalysis: { id: number; datasetVersion: number } | null;
  /** the newest review round */
  lastRound: {
    round: number;
    decision: "approved" | "changes_requested" | null;
    analysisId: number;
    datasetVersion: number;
    commentCount: number;
  } | null;
}

export interface StudyStatus {
  state: StudyState;
  /** a few words for lists and badges */
  label: string;
  /** one sentence: what the records say */
  detail: string;
  nextStep: { who: NextStepWho; where: NextStepWhere; action: string };
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The analyst's remaining work on a draft, before it can be submitted; null when there is none. */
function draftWork(r: StudyStatusRecords): Omit<StudyStatus, "label"> | null {
  if (r.outOfScope)
    return {
      state: "out-of-scope",
      detail: r.outOfScope,
      nextStep: { who: "analyst", where: "design", action: "Review the design answers" },
    };
  if (!r.designComplete)
    return {
      state: "design-open",
      detail: "Some design questions are not answered yet.",
      nextStep: { who: "analyst", where: "design", action: "Answer the design questions" },
    };
  if (!r.planLocked)
    return {
      state: "plan-open",
      detail: "The analysis plan is not locked yet; data can be uploaded once it is.",
      nextStep: { who: "analyst", where: "plan", action: "Lock the analysis plan" },
    };
  if (!r.activeDataset)
    return {
      state: "awaiting-data",
      detail: "The plan is locked; no data have been uploaded.",
      nextStep: { who: "analyst", where: "data", action: "Upload the data" },
    };
  const v = r.activeDataset.version;
  if (!r.analysisOnActive)
    return {
      state: "awaiting-analysis",
      detail: r.latestAnalysis
        ? `Data version ${v} is not analysed yet; the latest analysis used version ${r.latestAnalysis.datasetVersion}.`
        : `Data version ${v} is not analysed yet.`,
      nextStep: { who: "analyst", where: "choice", action: `Run the analysis on data version ${v}` },
    };
  return null;
}

const LABELS: Record<StudyState, string> = {
  "out-of-scope": "Outside what Waymark analyses",
  "design-open": "Design questions open",
  "plan-open": "Plan not locked",
  "awaiting-data": "Waiting for data",
  "awaiting-analysis": "Data not yet analysed",
  "ready-to-submit": "Ready to submit",
  "changes-requested": "Changes requested",
  "in-review": "Awaiting review",
  approved: "Approved",
};

export function studyStatus(r: StudyStatusRecords): StudyStatus {
  const round = r.lastRound;
  if (r.status === "approved" && round)
    return {
      state: "approved",
      label: LABELS.approved,
      detail: `Approved in round ${round.round} (analysis ${round.analysisId} on data version ${round.datasetVersion}); the report is ready.`,
      nextStep: { who: "writer", where: "report", action: "Download the report" },
    };
  if (r.status === "in_review" && round)
    return {
      state: "in-review",
      label: LABELS["in-review"],
      detail: `Round ${round.round} was submitted with analysis ${round.analysisId} on data version ${round.datasetVersion}.`,
      nextStep: { who: "reviewer", where: "review", action: "Review: approve or request changes" },
    };
  const work = draftWork(r);
  if (round?.decision === "changes_requested") {
    const asked = `The reviewer sent round ${round.round} back with ${plural(round.commentCount, "comment", "comments")}.`;
    return {
      state: "changes-requested",
      label: LABELS["changes-requested"],
      detail: work
        ? `${asked} ${work.detail}`
        : `${asked} Analysis ${r.analysisOnActive!.id} is on the active data version.`,
      nextStep: work
        ? { ...work.nextStep, action: `${work.nextStep.action}, then submit again` }
        : { who: "analyst", where: "results", action: "Reply to the comments and submit again" },
    };
  }
  if (work) return { ...work, label: LABELS[work.state] };
  return {
    state: "ready-to-submit",
    label: LABELS["ready-to-submit"],
    detail: `Analysis ${r.analysisOnActive!.id} on data version ${r.activeDataset!.version} is ready for review.`,
    nextStep: { who: "analyst", where: "results", action: "Submit for review" },
  };
}
