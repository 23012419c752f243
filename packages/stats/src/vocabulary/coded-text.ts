/**
 * A reason or caveat with a stable code and the numbers behind it beside its sentence, so a
 * screen can act on the code (mark, filter, translate) instead of searching English text.
 * Example: { code: "sd-ratio-large", params: { ratio: 3.1, limit: 2 }, text: "The largest SD is 3.1 times …" }.
 */
export interface CodedText {
  code: string;
  params: Record<string, string | number>;
  text: string;
}
