import type { z } from "zod";
import { ValidationError } from "./errors.js";

/** Parses a request part with a zod schema; the first problem names the field in the message. */
export function parseBody<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  const result = schema.safeParse(value ?? {});
  if (!result.success) {
    const issues = result.error.issues.map((i) => ({ field: i.path.join("."), message: i.message }));
    const first = issues[0];
    const message = first
      ? first.field
        ? `${first.field}: ${first.message}`
        : first.message
      : "Invalid request.";
    throw new ValidationError(message, { issues });
  }
  return result.data;
}
