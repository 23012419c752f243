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
  "analysis.run",
  "analysis.override",
  "study.submitted",
  "study.approved",
  "study.changes-requested",
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
