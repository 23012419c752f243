import type { CodedText } from "../vocabulary/coded-text.js";

/** Builds a coded sentence: a stable code, the numbers behind it, and the text. */
export function note(code: string, params: CodedText["params"], text: string): CodedText {
  return { code, params, text };
}
