import type { RequestHandler } from "express";

/** Ends a session that is older than `hours` since sign-in, however active it has been. */
export function absoluteSessionLimit(hours: number): RequestHandler {
  const maxMs = hours * 3600_000;
  return (req, _res, next) => {
    const started = (req.session as unknown as { startedAt?: number } | undefined)?.startedAt;
    if (started && Date.now() - started > maxMs) {
      // A fresh, empty session: the caller is signed out and must sign in again.
      req.session.regenerate((err) => next(err));
      return;
    }
    next();
  };
}
