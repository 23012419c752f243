import type { RequestHandler } from "express";
import { ForbiddenError, UnauthenticatedError } from "../http/errors.js";
import { decide, describePolicy, type Policy } from "./policy.js";

/** The one authorization middleware: applies a route's declared policy to the signed-in user. */
export function authorize(p: Policy): RequestHandler {
  return (req, _res, next) => {
    const decision = decide(p, req.user ?? null);
    if (decision === "unauthenticated") return next(new UnauthenticatedError());
    if (decision === "forbidden") {
      return next(
        new ForbiddenError(
          req.user && !req.user.active
            ? "This account has been deactivated."
            : `This action is for ${describePolicy(p)}; you are signed in as ${req.user?.role}.`,
        ),
      );
    }
    next();
  };
}
