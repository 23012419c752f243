/**
 * The one sanitizer for text that reaches a renderer: figures (SVG → PNG), the DOCX (XML 1.0)
 * and e-mail. XML 1.0 (§2.2) forbids C0 control characters other than tab, line feed and
 * carriage return, lone surrogates and U+FFFE/U+FFFF; the chart renderer refuses them too, and
 * C1 controls (U+0080–U+009F) print as nothing useful anywhere. They are replaced by U+FFFD so a
 * reader sees that something was there. New input with them is refused where it is stored
 * (controlCharacterIn), so this only guards what was stored before and text built from it.
 * Character classes only: linear on any input.
 */
const UNPRINTABLE =
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;
const LINE_BREAKS = /[\t\n\r]/g;

/** Text safe for any renderer; `singleLine` also turns tabs and line breaks into spaces (labels, subjects). */
export function printable(text: string, { singleLine = false } = {}): string {
  const clean = text.replace(UNPRINTABLE, "\uFFFD");
  return singleLine ? clean.replace(LINE_BREAKS, " ") : clean;
}

/** The first control character in a name or unit (one check, in the contract that refuses them). */
export { controlCharacterIn } from "@waymark/contract";

/** printable() applied to every string inside plain data (arrays and objects), for renderer input. */
export function printableDeep<T>(value: T): T {
  if (typeof value === "string") return printable(value) as T;
  if (Array.isArray(value)) return value.map(printableDeep) as T;
  if (value && typeof value === "object" && Object.getPrototypeOf(value) === Object.prototype) {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = printableDeep(v);
    return out as T;
  }
  return value;
}
