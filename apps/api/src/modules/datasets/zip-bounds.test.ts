import ExcelJS from "exceljs";
import JSZip from "jszip";
import { describe, expect, it } from "vitest";
import { zipBoundsProblem } from "./zip-bounds.js";

describe("zipBoundsProblem (ZIP central directory, PKWARE APPNOTE §4.3.12)", () => {
  it("accepts an ordinary workbook", async () => {
    const wb = new ExcelJS.Workbook();
    wb.addWorksheet("data").addRow(["Line", "Yield"]);
    expect(zipBoundsProblem(Buffer.from(await wb.xlsx.writeBuffer()))).toBeNull();
  });

  it("refuses an archive whose parts would expand beyond the bound, without inflating it", async () => {
    const zip = new JSZip();
    zip.file("xl/worksheets/sheet1.xml", "0".repeat(2 * 1024 * 1024));
    const bytes = await zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE" });
    expect(bytes.length).toBeLessThan(50_000); // 2 MB of zeros compress to a few KB: a small bomb
    expect(zipBoundsProblem(bytes, { maxEntries: 100, maxExpandedBytes: 1024 * 1024 })).toMatch(
      /expand to more than 1 MB/,
    );
    expect(zipBoundsProblem(bytes, { maxEntries: 100, maxExpandedBytes: 4 * 1024 * 1024 })).toBeNull();
  });

  it("refuses too many parts and a ZIP64-sized part", async () => {
    const zip = new JSZip();
    for (let i = 0; i < 5; i++) zip.file(`p${i}.xml`, "x");
    const bytes = await zip.generateAsync({ type: "nodebuffer" });
    expect(zipBoundsProblem(bytes, { maxEntries: 4, maxExpandedBytes: 1e9 })).toMatch(/5 parts/);
    // Claim a 4 GB part in the first central-directory entry.
    const cd = bytes.readUInt32LE(bytes.length - 22 + 16);
    bytes.writeUInt32LE(0xffffffff, cd + 24);
    expect(zipBoundsProblem(bytes)).toMatch(/larger than 4 GB/);
  });

  it("calls a truncated archive damaged", () => {
    expect(zipBoundsProblem(Buffer.from([0x50, 0x4b, 0x03, 0x04, 1, 2, 3]))).toMatch(/damaged/);
  });
});
