import type { Block } from "@waymark/contract";

const MISSING = /-?\b(NaN|undefined|Infinity)\b/g;

/** Text safe to show: a stray non-number or missing value becomes a dash, never "NaN" or "undefined". */
export function clean(text: unknown): string {
  if (typeof text === "number") return Number.isFinite(text) ? String(text) : "—";
  if (typeof text !== "string") return "";
  return text.replace(MISSING, "—");
}

/** A table cell: an empty or missing value is a dash. */
export function cleanCell(text: unknown): string {
  const t = clean(text).trim();
  return t === "" || t === "null" ? "—" : t;
}

function blockText(b: Block): string {
  switch (b.type) {
    case "heading":
      return clean(b.text);
    case "paragraph":
      return b.runs.map((r) => clean(r.text)).join("");
    case "table":
      return [
        clean(b.caption),
        b.header.map(cleanCell).join("\t"),
        ...b.rows.map((r) => r.map(cleanCell).join("\t")),
      ].join("\n");
    case "figure":
      return clean(b.caption);
    case "caution":
      return clean(b.text);
    case "references":
      return b.items.map(clean).join("\n");
  }
}

/**
 * The plain text of the Methods part: the blocks after the "Methods" heading up to the next
 * heading of the same or a higher level, sub-headings included. Null when there is no such part.
 */
export function methodsText(blocks: Block[]): string | null {
  const start = blocks.findIndex((b) => b.type === "heading" && b.text.trim().toLowerCase() === "methods");
  if (start < 0) return null;
  const level = (blocks[start] as { level: number }).level;
  const part: Block[] = [];
  for (const b of blocks.slice(start + 1)) {
    if (b.type === "heading" && b.level <= level) break;
    part.push(b);
  }
  return part
    .map(blockText)
    .filter((t) => t.trim().length > 0)
    .join("\n\n");
}
