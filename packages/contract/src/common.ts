import { z } from "zod";
import type { CodedText } from "@waymark/stats/vocabulary";
import { ALPHA_MESSAGE, LIMITS } from "./limits.js";

const CONTROL =
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  /[\u0000-\u001F\u007F-\u009F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
const CONTROL_EXCEPT_BREAKS =
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/**
 * The first control character in a text, as "U+0007", or null. Names and units are printed in
 * figures, the DOCX (XML 1.0 forbids most C0 controls) and e-mail, so they are refused where
 * they are stored; `allowBreaks` lets tabs and line breaks through for multi-line text.
 * Character classes only: linear on any input.
 */
export function controlCharacterIn(text: string, { allowBreaks = false } = {}): string | null {
  const m = (allowBreaks ? CONTROL_EXCEPT_BREAKS : CONTROL).exec(text);
  return m ? `U+${m[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, "0")}` : null;
}

/** A text field that refuses control characters, naming the one it found. */
export const printableText = (label: string, max: number, { allowBreaks = false } = {}) =>
  z
    .string()
    .trim()
    .max(max, `${label} must be at most ${max} characters`)
    .superRefine((s, ctx) => {
      const c = controlCharacterIn(s, { allowBreaks });
      if (c)
        ctx.addIssue({ code: "custom", message: `${label} contains the control character ${c}; remove it` });
    });

/** A required text field with the limit named in its message. */
export const text = (label: string, max: number, options: { allowBreaks?: boolean } = {}) =>
  printableText(label, max, options).refine((s) => s.length >= 1, `${label} is required`);

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
