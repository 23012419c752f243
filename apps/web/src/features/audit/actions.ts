import type { AuditAction } from "@waymark/contract";

/** The actions the audit trail records (the contract's list), each in plain words. */
export const ACTION_LABELS: Record<AuditAction, string> = {
  "auth.sign-in": "Signed in",
  "auth.sign-in-failed": "Sign-in refused",
  "auth.sign-out": "Signed out",
  "auth.reauth-failed": "Password re-entry refused",
  "study.created": "Study created",
  "study.updated": "Study details changed",
  "study.design-saved": "Design answers saved",
  "study.plan-saved": "Plan saved",
  "study.plan-locked": "Plan locked",
  "dataset.uploaded": "Data uploaded",
  "dataset.activated": "Data version made active",
  "analysis.run": "Analysis run",
  "analysis.override": "Test other than the planned one run",
  "study.submitted": "Submitted for review",
  "study.approved": "Approved with signature",
  "study.changes-requested": "Changes requested",
  "study.comment-answered": "Reply to a review comment",
  "invitation.sent": "Invitation sent",
  "invitation.accepted": "Invitation accepted",
  "user.role-changed": "Role changed",
  "user.deactivated": "Account deactivated",
  "user.reactivated": "Account reactivated",
  "user.password-changed": "Password changed",
  "organization.settings-changed": "Settings changed",
  "report.downloaded": "Report downloaded",
  "mail.failed": "E-mail not delivered",
};

/** Actions a reviewer should notice at a glance. */
export const FLAGGED_ACTIONS: ReadonlySet<string> = new Set([
  "analysis.override",
  "auth.sign-in-failed",
  "auth.reauth-failed",
  "mail.failed",
]);

export function actionLabel(action: string): string {
  return Object.hasOwn(ACTION_LABELS, action) ? ACTION_LABELS[action as AuditAction] : action;
}
