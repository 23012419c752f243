import { z } from "zod";
import {
  ADJUSTMENTS,
  CHECKS,
  COMPARISONS,
  OMNIBUS_TESTS,
  OUTCOME_QUESTIONS,
  PLANNED_SIZES,
  POLICIES,
  POSTHOC_FAMILIES,
  SCALES,
} from "@waymark/stats/vocabulary";

/**
 * The shared enums. Statistical ids come from @waymark/stats's vocabulary (the engine owns
 * them and stays free of zod); the product's own (roles, study status, review steps, …) are
 * declared here. Each list exists once; types are inferred.
 */
export const omnibusTest = z.enum(OMNIBUS_TESTS, "test must be anova, welch or kruskal-wallis");
export const posthocFamily = z.enum(POSTHOC_FAMILIES);
export const adjustment = z.enum(ADJUSTMENTS, "adjust must be holm, bonferroni or bh");
export const policy = z.enum(POLICIES, "policy must be classic-first or welch-first");
export const scale = z.enum(SCALES);
export const comparisons = z.enum(COMPARISONS);
export const checkId = z.enum(CHECKS);

export const ROLES = ["analyst", "reviewer", "writer", "admin"] as const;
export const role = z.enum(ROLES, "Choose analyst, reviewer, writer or admin");
export type Role = z.infer<typeof role>;

export const STUDY_STATUSES = ["draft", "in_review", "approved"] as const;
export const studyStatus = z.enum(STUDY_STATUSES);
export type StudyStatus = z.infer<typeof studyStatus>;

export const STUDY_CONTEXTS = ["general", "clinical", "safety-critical"] as const;
export const studyContext = z.enum(STUDY_CONTEXTS, "Choose general, clinical or safety-critical");
export type StudyContext = z.infer<typeof studyContext>;

export const REVIEW_STEPS = ["design", "plan", "data", "checks", "choice", "results"] as const;
export const reviewStep = z.enum(REVIEW_STEPS);
export type ReviewStep = z.infer<typeof reviewStep>;

export const REVIEW_DECISIONS = ["approved", "changes_requested"] as const;
export const reviewDecision = z.enum(REVIEW_DECISIONS);
export type ReviewDecision = z.infer<typeof reviewDecision>;

export const LAYOUTS = ["long", "wide"] as const;
export const layout = z.enum(
  LAYOUTS,
  "layout must be long (a group column and an outcome column) or wide (one column per group)",
);
export type Layout = z.infer<typeof layout>;

export const EXCLUSION_REASONS = ["missing", "non-numeric", "missing-group", "unknown-level"] as const;
export const exclusionReason = z.enum(EXCLUSION_REASONS);
export type ExclusionReason = z.infer<typeof exclusionReason>;

export const PAPER_SIZES = ["A4", "Letter"] as const;
export const paperSize = z.enum(PAPER_SIZES);
export type PaperSize = z.infer<typeof paperSize>;

/** Design questions: each answer may still be "unsure". */
export const DESIGN_ANSWERS = {
  independence: ["independent", "paired", "unsure"],
  scale: [...SCALES, "unsure"],
  question: [...OUTCOME_QUESTIONS, "unsure"],
  groupSizes: [...PLANNED_SIZES, "unsure"],
  hasControl: ["yes", "no", "unsure"],
  comparisons: [...COMPARISONS, "unsure"],
  assignment: ["randomized", "convenience", "observational", "unsure"],
} as const satisfies Record<string, readonly string[]>;
export type DesignQuestion = keyof typeof DESIGN_ANSWERS;
export const DESIGN_QUESTIONS = Object.keys(DESIGN_ANSWERS) as DesignQuestion[];

/** Every action the audit trail records, named once. */
export const AUDIT_ACTIONS = [
  "auth.sign-in",
  "auth.sign-in-failed",
  "auth.sign-out",
  "auth.reauth-failed",
  "study.created",
  "study.updated",
  "study.design-saved",
  "study.plan-saved",
  "study.plan-locked",
  "dataset.uploaded",
  "dataset.activated",
  "analysis.run",
  "analysis.override",
  "study.submitted",
  "study.approved",
  "study.changes-requested",
  "study.comment-answered",
  "invitation.sent",
  "invitation.accepted",
  "user.role-changed",
  "user.deactivated",
  "user.reactivated",
  "user.password-changed",
  "organization.settings-changed",
  "report.downloaded",
  "mail.failed",
] as const;

export type AuditAction = (typeof AUDIT_ACTIONS)[number];
