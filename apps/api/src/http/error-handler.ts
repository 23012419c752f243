import type { ErrorRequestHandler, RequestHandler } from "express";
import { MulterError } from "multer";
import { StatsInputError } from "@waymark/stats";
import { HttpError, NotFoundError } from "./errors.js";

/** The one shape every error body takes. */
export interface ErrorBody {
  error: { code: string; message: string; details?: unknown };
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new NotFoundError(`No API route for ${req.method} ${req.path.slice(0, 200)}.`));
};

/**
 * The one mapping from every library's error class to the error shape. Anything not named here is
 * our fault: logged and answered 500 without details.
 */
export function toHttpError(err: unknown): HttpError | null {
  if (err instanceof HttpError) return err;
  // The statistics engine refuses inputs it cannot compute with (power for f = 1e-6, α = 5e-324).
  if (err instanceof StatsInputError) return new HttpError(422, "cannot_compute", err.message);
  if (err instanceof MulterError)
    return new HttpError(400, "bad_upload", `The upload could not be read: ${err.message}.`);
  if (typeof err !== "object" || err === null) return null;
  const e = err as { code?: unknown; type?: unknown; status?: unknown; message?: unknown };
  if (e.code === "EBADCSRFTOKEN")
    return new HttpError(
      403,
      "csrf_invalid",
      "This request did not carry Waymark's form token, so it was refused. Reload the page and try again.",
    );
  // The router's decoding of "%" or "%FF" in the address (a URIError carrying 400).
  if (err instanceof URIError)
    return new HttpError(
      400,
      "bad_address",
      "The address holds a broken percent-encoding (such as % or %FF).",
    );
  // body-parser (express.json) and raw-body.
  if (typeof e.type === "string" && typeof e.status === "number") {
    switch (e.type) {
      case "entity.too.large":
        return new HttpError(413, "payload_too_large", "The request body is too large.");
      case "entity.parse.failed":
        return new HttpError(400, "bad_request", "The request body is not valid JSON.");
      case "request.aborted":
      case "request.size.invalid":
        return new HttpError(400, "bad_request", "The request body ended before its declared length.");
      case "encoding.unsupported":
      case "charset.unsupported":
        return new HttpError(
          415,
          "unsupported_media_type",
          "The request body's encoding or charset is not supported.",
        );
      default:
        return new HttpError(400, "bad_request", "The request body could not be read.");
    }
  }
  // busboy (under multer) throws plain Errors for broken multipart bodies.
  if (
    typeof e.message === "string" &&
    /^(Multipart: |Unexpected end of form|Malformed part header|Malformed urlencoded form)/.test(e.message)
  )
    return new HttpError(400, "bad_upload", `The upload could not be read: ${e.message}.`);
  // Other http-errors style client errors that say they may be shown.
  if (
    typeof e.status === "number" &&
    e.status >= 400 &&
    e.status < 500 &&
    (err as { expose?: unknown }).expose
  )
    return new HttpError(e.status, "bad_request", String(e.message ?? "The request could not be read."));
  return null;
}

/** Registered last. Express 5 forwards rejected promises here by itself. */
export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  const known = toHttpError(err);
  if (!known) console.error(err);
  const status = known?.status ?? 500;
  const body: ErrorBody = known
    ? {
        error: {
          code: known.code,
          message: known.message,
          ...(known.details ? { details: known.details } : {}),
        },
      }
    : { error: { code: "internal", message: "Something went wrong on our side. Please try again." } };
  if (res.headersSent) return void res.end();
  res.status(status).json(body);
};
