import { z } from "zod";
import type { CodedText } from "@waymark/stats/vocabulary";
import { ALPHA_MESSAGE, LIMITS } from "./limits.js";

/** A required text field with the limit named in its message. */
export const text = (label: string, max: number) =>
  z.string().trim().min(1, `${label} is required`).max(max, `${label} must be at most ${max} characters`);

/** α in (0, .20]: the one check, the one message (the API's 4xx and the web's forms alike). */
export const alpha = z
  .number("Enter α as a number, for example 0.05")
  .gt(0, ALPHA_MESSAGE)
  .max(LIMITS.alphaMax, ALPHA_MESSAGE);

/** Dates cross the wire as ISO text. */
export const timestamp = z
  .union([z.string(), z.date()])
  .transform((d) => (d instanceof Date ? d.toISOString() : d));

export const person = z.object({ id: z.number(), displayName: z.string() });
export type Person = z.infer<typeof person>;

/** A reason or caveat with a stable code and its numbers beside the sentence (CodedText in the vocabulary). */
export const codedText = z.object({
  code: z.string(),
  params: z.record(z.string(), z.union([z.string(), z.number()])),
  text: z.string(),
}) satisfies z.ZodType<CodedText>;
