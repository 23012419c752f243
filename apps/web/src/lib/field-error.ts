import { ApiError } from "./api-client";

/**
 * Splits a server refusal that names a field ("password: Use at least 12 characters.") into the
 * field and the message, so a form can show it under the right input. Null when it names none.
 */
export function fieldError(err: unknown): { field: string; message: string } | null {
  if (!(err instanceof ApiError)) return null;
  const issues = (err.details as { issues?: { field?: unknown; message?: unknown }[] } | undefined)?.issues;
  const first = Array.isArray(issues) ? issues[0] : undefined;
  if (first && typeof first.field === "string" && first.field && typeof first.message === "string")
    return { field: first.field, message: first.message };
  const m = /^([A-Za-z][\w.]*): (.+)$/s.exec(err.message);
  return m ? { field: m[1]!, message: m[2]! } : null;
}
