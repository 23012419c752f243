import type { Request, RequestHandler } from "express";
import { ipKeyGenerator, rateLimit } from "express-rate-limit";
import type { DataSource } from "typeorm";
import { HttpError } from "../http/errors.js";
import { DatabaseRateLimitStore } from "./sign-in-throttle-store.js";

const WINDOW_MS = 15 * 60 * 1000;

function limitReached(req: Request, what: string): HttpError {
  const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
  const minutes = Math.max(
    1,
    Math.ceil(((reset?.getTime() ?? Date.now() + WINDOW_MS) - Date.now()) / 60_000),
  );
  return new HttpError(
    429,
    "too_many_attempts",
    `Too many failed sign-ins ${what}. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`,
  );
}

/**
 * Throttles failed sign-ins per account and per IP address (successful ones do not count).
 * Counters live in the database (`sign-in-throttle-store.ts`), so several API instances on one
 * database count failures together.
 */
export function signInThrottle(
  ds: DataSource,
  opts: { perAccount: number; perIp: number },
): RequestHandler[] {
  const common = {
    windowMs: WINDOW_MS,
    skipSuccessfulRequests: true,
    standardHeaders: "draft-8" as const,
    legacyHeaders: false,
  };
  return [
    rateLimit({
      ...common,
      limit: opts.perIp,
      store: new DatabaseRateLimitStore(ds, "ip"),
      keyGenerator: (req) => ipKeyGenerator(req.ip ?? "unknown"),
      handler: (req, _res, next) => next(limitReached(req, "from this network address")),
    }),
    rateLimit({
      ...common,
      limit: opts.perAccount,
      store: new DatabaseRateLimitStore(ds, "account"),
      keyGenerator: (req) => String((req.body as { email?: unknown } | undefined)?.email ?? "").toLowerCase(),
      handler: (req, _res, next) => next(limitReached(req, "for this account")),
    }),
  ];
}
