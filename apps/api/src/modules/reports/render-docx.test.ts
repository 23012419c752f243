import JSZip from "jszip";
import { describe, expect, it } from "vitest";
import { paragraph } from "./report-blocks.js";
import { renderDocx } from "./render-docx.js";

describe("renderDocx", () => {
  it("writes hostile text from titles, group names and comments as inert text", async () => {
    const hostile = `<script>alert("x")</script> & <w:p/> ]]> =HYPERLINK("http://x.test")`;
    const buf = await renderDocx(
      [
        { type: "heading", level: 1, text: hostile },
        paragraph(`Group ${hostile} differed`),
        { type: "table", caption: "Table 1. By group", header: ["Group", "n"], rows: [[hostile, "3"]] },
      ],
      { draft: false, paperSize: "A4", title: hostile, images: new Map() },
    );
    const xml = await (await JSZip.loadAsync(buf)).file("word/document.xml")!.async("string");
    expect(xml).not.toContain("<script>");
    expect(xml).toContain("&lt;script&gt;");
    expect(xml).toContain("&lt;w:p/&gt;");
    // Every <w:p> the document holds is one we made: the injected one stayed text.
    expect(xml.match(/<w:p[ >]/g)!.length).toBeLessThan(20);
  });

  it("sets the page size from the organization setting (OOXML twentieths of a point)", async () => {
    const size = async (paperSize: "A4" | "Letter") => {
      const buf = await renderDocx([paragraph("x")], {
        draft: true,
        paperSize,
        title: "t",
        images: new Map(),
      });
      return /<w:pgSz w:w="(\d+)" w:h="(\d+)"/
        .exec(await (await JSZip.loadAsync(buf)).file("word/document.xml")!.async("string"))!
        .slice(1);
    };
    // A4 is 210 × 297 mm = 11906 × 16838 twips; US Letter 8.5 × 11 in = 12240 × 15840 (ISO 216; ANSI/ASME Y14.1).
    expect(await size("A4")).toEqual(["11906", "16838"]);
    expect(await size("Letter")).toEqual(["12240", "15840"]);
  });
});
