/** Errors thrown anywhere in a request become `{"error":{"code","message"}}` in the error handler. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export class BadRequestError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(400, "bad_request", message, details);
  }
}
export class ValidationError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(400, "validation_failed", message, details);
  }
}
export class UnauthenticatedError extends HttpError {
  constructor(message = "Please sign in to continue.") {
    super(401, "unauthenticated", message);
  }
}
export class ForbiddenError extends HttpError {
  constructor(message = "Your role does not allow this action.") {
    super(403, "forbidden", message);
  }
}
export class NotFoundError extends HttpError {
  constructor(message = "Not found.") {
    super(404, "not_found", message);
  }
}
export class ConflictError extends HttpError {
  constructor(message: string) {
    super(409, "conflict", message);
  }
}
