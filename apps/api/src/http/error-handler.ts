import type { ErrorRequestHandler, RequestHandler } from "express";
import { HttpError, NotFoundError } from "./errors.js";

/** The one shape every error body takes. */
export interface ErrorBody {
  error: { code: string; message: string; details?: unknown };
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new NotFoundError(`No API route for ${req.method} ${req.path}.`));
};

/** Registered last. Express 5 forwards rejected promises here by itself. */
export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  let status = 500;
  let body: ErrorBody = {
    error: { code: "internal", message: "Something went wrong on our side. Please try again." },
  };
  if (err instanceof HttpError) {
    status = err.status;
    body = {
      error: { code: err.code, message: err.message, ...(err.details ? { details: err.details } : {}) },
    };
  } else if (isCsrfError(err)) {
    status = 403;
    body = {
      error: {
        code: "csrf_invalid",
        message:
          "This request did not carry Waymark's form token, so it was refused. Reload the page and try again.",
      },
    };
  } else if (isBodyParserError(err)) {
    status = err.status;
    body = {
      error: {
        code: err.type === "entity.too.large" ? "payload_too_large" : "bad_request",
        message:
          err.type === "entity.too.large"
            ? "The request body is too large."
            : "The request body is not valid JSON.",
      },
    };
  } else {
    console.error(err);
  }
  res.status(status).json(body);
};

function isCsrfError(err: unknown): boolean {
  return typeof err === "object" && err !== null && (err as { code?: unknown }).code === "EBADCSRFTOKEN";
}

function isBodyParserError(err: unknown): err is { status: number; type: string } {
  return typeof err === "object" && err !== null && "type" in err && "status" in err;
}
