// Every action the audit trail records is named once, in the contract (the web labels each one).
export { AUDIT_ACTIONS, type AuditAction } from "@waymark/contract";
