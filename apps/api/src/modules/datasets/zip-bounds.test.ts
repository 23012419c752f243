import ExcelJS from "exceljs";
import JSZip from "jszip";
import { describe, expect, it } from "vitest";
import { HttpError } from "../../http/errors.js";
import { InflateBudget, inflateEntry, listZipEntries } from "./zip-bounds.js";

async function problem(fn: () => unknown): Promise<string> {
  try {
    await fn();
  } catch (e) {
    if (e instanceof HttpError) return `${e.status} ${e.message}`;
    throw e;
  }
  return "none";
}

/** Rewrites every central-directory entry's declared size, as a bomb's header would. */
function declareSizes(bytes: Buffer, size: number): void {
  let p = bytes.readUInt32LE(bytes.length - 22 + 16);
  const n = bytes.readUInt16LE(bytes.length - 22 + 10);
  for (let i = 0; i < n; i++) {
    bytes.writeUInt32LE(size, p + 24);
    p += 46 + bytes.readUInt16LE(p + 28) + bytes.readUInt16LE(p + 30) + bytes.readUInt16LE(p + 32);
  }
}

describe("bounded ZIP reading (PKWARE APPNOTE §4.3.12)", () => {
  it("lists an ordinary workbook's parts", async () => {
    const wb = new ExcelJS.Workbook();
    wb.addWorksheet("data").addRow(["Line", "Yield"]);
    const names = listZipEntries(Buffer.from(await wb.xlsx.writeBuffer())).map((e) => e.name);
    expect(names).toContain("xl/worksheets/sheet1.xml");
  });

  it("stops inflating a part that declares 1,000 bytes but expands past the bound", async () => {
    const zip = new JSZip();
    zip.file("xl/worksheets/sheet1.xml", "0".repeat(8 * 1024 * 1024));
    const bytes = await zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE" });
    declareSizes(bytes, 1000);
    const bounds = { maxEntries: 100, maxExpandedBytes: 1024 * 1024 };
    const entry = listZipEntries(bytes, bounds).find((e) => e.name.endsWith("sheet1.xml"));
    let seen = 0;
    const outcome = await problem(() =>
      inflateEntry(bytes, entry!, new InflateBudget(bounds), (c) => {
        seen += c.length;
      }),
    );
    expect(outcome).toMatch(/^413 .*more than 1 MB \(while unpacking xl\/worksheets\/sheet1.xml\)/);
    // Stopped within one 256 KB piece of the bound, not at 8 MB.
    expect(seen).toBeLessThanOrEqual(1024 * 1024 + 256 * 1024);
  });

  it("refuses early when the declared sizes already pass the bound", async () => {
    const zip = new JSZip();
    zip.file("a.xml", "x");
    const bytes = await zip.generateAsync({ type: "nodebuffer" });
    declareSizes(bytes, 0xf0000000);
    expect(await problem(() => listZipEntries(bytes))).toMatch(/^413 .*would expand to more than 100 MB/);
  });

  it("refuses too many parts and a ZIP64-sized part", async () => {
    const zip = new JSZip();
    for (let i = 0; i < 5; i++) zip.file(`p${i}.xml`, "x");
    const bytes = await zip.generateAsync({ type: "nodebuffer" });
    expect(await problem(() => listZipEntries(bytes, { maxEntries: 4, maxExpandedBytes: 1e9 }))).toMatch(
      /5 parts/,
    );
    declareSizes(bytes, 0xffffffff);
    expect(await problem(() => listZipEntries(bytes))).toMatch(/larger than 4 GB/);
  });

  it("calls a truncated archive damaged", async () => {
    expect(await problem(() => listZipEntries(Buffer.from([0x50, 0x4b, 0x03, 0x04, 1, 2, 3])))).toMatch(
      /damaged/,
    );
  });
});
