import { printable, printableDeep } from "../../text/printable.js";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import {
  AlignmentType,
  BorderStyle,
  Document,
  Footer,
  Header,
  HeadingLevel,
  ImageRun,
  Packer,
  PageNumber,
  Paragraph,
  ShadingType,
  Table,
  TableCell,
  TableRow,
  TextRun,
  WidthType,
} from "docx";
import type { Block, Run } from "./report-blocks.js";

const FONT_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../../../../fonts");
const FONT = "IBM Plex Sans";
const INK = "1E2A32";

/** Page sizes in twentieths of a point (OOXML page units). */
const PAGE = { A4: { width: 11906, height: 16838 }, Letter: { width: 12240, height: 15840 } } as const;

let fontCache: { data: Buffer; bold: Buffer; italic: Buffer } | null = null;
function fonts() {
  fontCache ??= {
    data: fs.readFileSync(path.join(FONT_DIR, "IBMPlexSans-Regular.ttf")),
    bold: fs.readFileSync(path.join(FONT_DIR, "IBMPlexSans-SemiBold.ttf")),
    italic: fs.readFileSync(path.join(FONT_DIR, "IBMPlexSans-Italic.ttf")),
  };
  return fontCache;
}

const runs = (rs: Run[]) => rs.map((r) => new TextRun({ text: r.text, italics: r.italic, bold: r.bold }));

function cell(text: string, header: boolean, numeric: boolean): TableCell {
  return new TableCell({
    children: [
      new Paragraph({
        alignment: numeric ? AlignmentType.RIGHT : AlignmentType.LEFT,
        children: [new TextRun({ text, bold: header })],
      }),
    ],
    shading: header ? { type: ShadingType.CLEAR, fill: "E4DED3", color: "auto" } : undefined,
    margins: { top: 40, bottom: 40, left: 80, right: 80 },
  });
}

function table(b: Extract<Block, { type: "table" }>): (Paragraph | Table)[] {
  const line = { style: BorderStyle.SINGLE, size: 6, color: INK };
  const none = { style: BorderStyle.NONE, size: 0, color: "FFFFFF" };
  return [
    new Paragraph({ style: "Caption", children: [new TextRun(b.caption)], keepNext: true }),
    new Table({
      width: { size: 100, type: WidthType.PERCENTAGE },
      // Horizontal rules only, as reporting style guides set tables.
      borders: {
        top: line,
        bottom: line,
        left: none,
        right: none,
        insideHorizontal: none,
        insideVertical: none,
      },
      rows: [
        new TableRow({ tableHeader: true, children: b.header.map((h, i) => cell(h, true, i > 0)) }),
        ...b.rows.map((r) => new TableRow({ children: r.map((c, i) => cell(c, false, i > 0)) })),
      ],
    }),
    new Paragraph({ text: "" }),
  ];
}

function figure(b: Extract<Block, { type: "figure" }>, images: Map<string, Buffer>): Paragraph[] {
  const png = images.get(b.figure);
  // build-report adds a figure only when it can be drawn; without an image, print nothing rather than a placeholder.
  if (!png) return [];
  // PNG header: width and height at bytes 16–23.
  const w = png.readUInt32BE(16);
  const h = png.readUInt32BE(20);
  const width = 600;
  return [
    new Paragraph({
      alignment: AlignmentType.CENTER,
      keepNext: true,
      children: [
        new ImageRun({
          type: "png",
          data: png,
          transformation: { width, height: Math.round((width * h) / w) },
        }),
      ],
    }),
    new Paragraph({ style: "Caption", children: [new TextRun(b.caption)] }),
  ];
}

/**
 * Writes the report blocks as a DOCX with Word's own heading, caption and table styles, the
 * product font embedded (Calibri named as fallback), and — for drafts — "Not approved" on
 * every page.
 */
export async function renderDocx(
  blocks: Block[],
  opts: { draft: boolean; paperSize: "A4" | "Letter"; title: string; images: Map<string, Buffer> },
): Promise<Buffer> {
  const children: (Paragraph | Table)[] = [];
  // Every string that becomes XML goes through the one sanitizer first.
  blocks = printableDeep(blocks);
  opts = { ...opts, title: printable(opts.title, { singleLine: true }) };
  for (const b of blocks) {
    if (b.type === "heading") {
      const level =
        b.level === 1 ? HeadingLevel.TITLE : b.level === 2 ? HeadingLevel.HEADING_1 : HeadingLevel.HEADING_2;
      children.push(new Paragraph({ heading: level, children: [new TextRun(b.text)] }));
    } else if (b.type === "paragraph")
      children.push(new Paragraph({ children: runs(b.runs), spacing: { after: 120 } }));
    else if (b.type === "table") children.push(...table(b));
    else if (b.type === "figure") children.push(...figure(b, opts.images));
    else if (b.type === "caution") {
      children.push(
        new Paragraph({
          border: { left: { style: BorderStyle.SINGLE, size: 24, color: "D9961A", space: 8 } },
          shading: { type: ShadingType.CLEAR, fill: "F8EAD0", color: "auto" },
          spacing: { before: 120, after: 120 },
          children: [new TextRun({ text: b.text, bold: true })],
        }),
      );
    } else if (b.type === "references") {
      for (const item of b.items)
        children.push(
          new Paragraph({
            indent: { left: 720, hanging: 720 },
            spacing: { after: 80 },
            children: [new TextRun(item)],
          }),
        );
    }
  }

  const draftMark = new Paragraph({
    alignment: AlignmentType.CENTER,
    children: [new TextRun({ text: "NOT APPROVED — DRAFT", bold: true, color: "A8432F", size: 28 })],
  });
  const doc = new Document({
    creator: "Waymark",
    title: opts.title,
    description: "Methods and results section generated by Waymark",
    fonts: [{ name: FONT, ...fonts() }],
    styles: {
      default: { document: { run: { font: FONT, size: 21, color: INK } } },
      paragraphStyles: [
        {
          id: "Caption",
          name: "Caption",
          basedOn: "Normal",
          next: "Normal",
          run: { italics: true, size: 19 },
          paragraph: { spacing: { before: 120, after: 80 } },
        },
      ],
    },
    sections: [
      {
        properties: {
          page: { size: PAGE[opts.paperSize], margin: { top: 1134, bottom: 1134, left: 1134, right: 1134 } },
        },
        headers: {
          default: new Header({
            children: opts.draft
              ? [draftMark]
              : [
                  new Paragraph({
                    alignment: AlignmentType.RIGHT,
                    children: [new TextRun({ text: "Waymark", color: "4A5862", size: 16 })],
                  }),
                ],
          }),
        },
        footers: {
          default: new Footer({
            children: [
              new Paragraph({
                alignment: AlignmentType.CENTER,
                children: [
                  new TextRun({
                    children: [
                      opts.draft ? "Not approved · page " : "Page ",
                      PageNumber.CURRENT,
                      " of ",
                      PageNumber.TOTAL_PAGES,
                    ],
                    size: 16,
                    color: "4A5862",
                  }),
                ],
              }),
            ],
          }),
        },
        children,
      },
    ],
  });
  return Packer.toBuffer(doc);
}
