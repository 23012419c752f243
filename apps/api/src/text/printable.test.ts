import JSZip from "jszip";
import { describe, expect, it } from "vitest";
import { groupsFigure } from "../modules/reports/figures.js";
import { renderDocx } from "../modules/reports/render-docx.js";
import { controlCharacterIn, printable } from "./printable.js";

describe("printable: the one sanitizer for figures, DOCX and e-mail (XML 1.0 §2.2 Char)", () => {
  it("replaces characters XML and the chart renderer refuse, and keeps everything else", () => {
    expect(printable("No\u0007rth\u0000 \u001b[31m")).toBe("No\uFFFDrth\uFFFD \uFFFD[31m");
    expect(printable("a\u0085b\uFFFEc\uD800d")).toBe("a\uFFFDb\uFFFDc\uFFFDd");
    expect(printable("Zürich 😀 tab\tline\n")).toBe("Zürich 😀 tab\tline\n");
    expect(printable("tab\tline\n", { singleLine: true })).toBe("tab line ");
  });

  it("names the first control character of a name", () => {
    expect(controlCharacterIn("North")).toBeNull();
    expect(controlCharacterIn("No\u0007rth")).toBe("U+0007");
    expect(controlCharacterIn("g\tkg")).toBe("U+0009");
  });

  it("lets a figure render whose group name holds a control character (the renderer refused it before)", async () => {
    const png = await groupsFigure(
      [
        { name: "No\u0007rth", values: [1, 2, 3] },
        { name: "South", values: [2, 3, 4] },
      ],
      "Yield (g\u0001)",
    );
    expect(png.subarray(1, 4).toString()).toBe("PNG");
  });

  it("writes a DOCX whose text held control characters as well-formed XML", async () => {
    const buf = await renderDocx(
      [
        { type: "heading", level: 1, text: "Study \u0007one" },
        { type: "paragraph", runs: [{ text: "Group No\u0000rth" }] },
        { type: "table", caption: "T\u0008", header: ["Group"], rows: [["No\u001frth"]] },
      ],
      { draft: true, paperSize: "A4", title: "t\u0003", images: new Map() },
    );
    const xml = await (await JSZip.loadAsync(buf)).file("word/document.xml")!.async("string");
    // eslint-disable-next-line no-control-regex -- looking for control characters is the point
    expect(xml).not.toMatch(/[\u0000-\u0008\u000b\u000c\u000e-\u001f]/);
    expect(xml).toContain("Study \uFFFDone");
  });
});
