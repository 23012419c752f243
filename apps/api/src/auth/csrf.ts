import type { Request } from "express";
import { csrfSync } from "csrf-sync";

/**
 * CSRF protection by the synchronizer-token pattern (csrf-sync): the token lives in the
 * server-side session and every state-changing /api request must echo it in the
 * `x-csrf-token` header. A cross-site form cannot read the token, so its post is refused.
 */
export const CSRF_HEADER = "x-csrf-token";

export const { csrfSynchronisedProtection, generateToken } = csrfSync({
  getTokenFromRequest: (req) => {
    const v = req.headers[CSRF_HEADER];
    return Array.isArray(v) ? v[0] : v;
  },
});

/** The session's token when it already has one; never creates one (and so never writes a session). */
export function existingToken(req: Request): string | undefined {
  const token = (req.session as { csrfToken?: unknown } | undefined)?.csrfToken;
  return typeof token === "string" ? token : undefined;
}
