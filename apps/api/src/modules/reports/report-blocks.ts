/**
 * The report as a list of blocks: one text source for both the HTML preview in the web app and
 * the DOCX, so the two cannot drift apart.
 */
import type { Block, ReportSection, Run } from "@waymark/contract";

/** The block model is the contract's (@waymark/contract, report.ts). */
export type { Block, Run };

/** Statistic symbols set in italics, as reporting style guides ask (APA 7th ed. §6.45, common practice). */
const SYMBOL = /(?<![\p{L}\d])(F|p|H|t|z|q|W|n|N|M|SD|SE|d|g|r)(?=\s?[(=<>≤≥,)]|\s[=<>])/gu;

/** Splits a sentence into runs with the statistic symbols in italics. */
export function statRuns(text: string): Run[] {
  const runs: Run[] = [];
  let last = 0;
  for (const m of text.matchAll(SYMBOL)) {
    if (m.index > last) runs.push({ text: text.slice(last, m.index) });
    runs.push({ text: m[0], italic: true });
    last = m.index + m[0].length;
  }
  if (last < text.length) runs.push({ text: text.slice(last) });
  return runs;
}

export function paragraph(text: string, section?: ReportSection): Block {
  return { type: "paragraph", runs: statRuns(text), ...(section ? { section } : {}) };
}

/** Plain text of a list of blocks (for "copy as plain text" and for tests). */
export function blocksToText(blocks: Block[]): string {
  return blocks
    .map((b) => {
      switch (b.type) {
        case "heading":
          return b.text;
        case "paragraph":
          return b.runs.map((r) => r.text).join("");
        case "table":
          return [b.caption, b.header.join("\t"), ...b.rows.map((r) => r.join("\t"))].join("\n");
        case "figure":
          return b.caption;
        case "caution":
          return b.text;
        case "references":
          return b.items.join("\n");
      }
    })
    .join("\n\n");
}
