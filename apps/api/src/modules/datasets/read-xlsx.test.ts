import ExcelJS from "exceljs";
import JSZip from "jszip";
import { describe, expect, it } from "vitest";
import { HttpError } from "../../http/errors.js";
import { readXlsx } from "./read-xlsx.js";

// The workbook reader's bounds (ECMA-376 Part 1 §18.3.1.35: <dimension ref> is the sheet's used
// range, written before <sheetData>). A declared range past the bounds refuses the file before
// anything else is read; a declared range is never trusted to let a file through.

const NS = 'xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"';
const REL_NS = 'xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"';

async function workbook(sheetXml: string, sharedStrings?: string): Promise<Buffer> {
  const zip = new JSZip();
  zip.file("[Content_Types].xml", '<?xml version="1.0"?><Types/>');
  zip.file(
    "xl/workbook.xml",
    `<?xml version="1.0"?><workbook ${NS} ${REL_NS}><sheets><sheet name="S1" sheetId="1" r:id="rId1"/></sheets></workbook>`,
  );
  zip.file(
    "xl/_rels/workbook.xml.rels",
    '<?xml version="1.0"?><Relationships><Relationship Id="rId1" Type="worksheet" Target="worksheets/sheet1.xml"/></Relationships>',
  );
  zip.file("xl/worksheets/sheet1.xml", sheetXml);
  if (sharedStrings !== undefined) zip.file("xl/sharedStrings.xml", sharedStrings);
  return zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE" });
}

async function refusal(bytes: Buffer): Promise<string> {
  try {
    await readXlsx(bytes);
  } catch (e) {
    if (e instanceof HttpError) return `${e.status} ${e.message}`;
    throw e;
  }
  return "read";
}

function rows(count: number, perRow: number): string {
  const parts: string[] = [];
  for (let r = 1; r <= count; r++) {
    let row = `<row r="${r}">`;
    for (let c = 0; c < perRow; c++) row += `<c r="${String.fromCharCode(65 + c)}${r}"><v>${r + c}</v></c>`;
    parts.push(row + "</row>");
  }
  return parts.join("");
}

describe("reading a workbook within its bounds", () => {
  it("refuses a sheet that declares a million rows before reading its shared strings", async () => {
    // The shared strings are damaged: had they been read first, the answer would say so.
    const bytes = await workbook(
      `<?xml version="1.0"?><worksheet ${NS}><dimension ref="A1:F1000000"/><sheetData>${rows(3, 6)}</sheetData></worksheet>`,
      `<?xml version="1.0"?><sst ${NS}><si><t>North</t`,
    );
    expect(await refusal(bytes)).toBe(
      "422 The first sheet spans 1,000,000 rows × 6 columns; Waymark reads at most 500,000 cells.",
    );
  });

  it("does not trust a small declared size: the cells are counted as they are read", async () => {
    const bytes = await workbook(
      `<?xml version="1.0"?><worksheet ${NS}><dimension ref="A1:B2"/><sheetData>${rows(83_334, 6)}</sheetData></worksheet>`,
    );
    expect(await refusal(bytes)).toMatch(
      /^422 The first sheet has more than 500,000 cells \(passed at cell [A-F]83334\)/,
    );
  });

  it("reads an ordinary workbook whose declared size is within the bounds", async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet("data");
    ws.addRow(["Line", "Yield (g)"]);
    ws.addRow(["North", 10.5]);
    ws.addRow(["South", 12]);
    const bytes = Buffer.from(await wb.xlsx.writeBuffer());
    const sheetXml = await (await JSZip.loadAsync(bytes)).file("xl/worksheets/sheet1.xml")!.async("string");
    expect(sheetXml).toMatch(/<dimension ref="A1:B3"\/>/);
    const table = await readXlsx(bytes);
    expect(table.columns).toEqual(["Line", "Yield (g)"]);
    expect(table.rows.map((r) => r.cells)).toEqual([
      ["North", "10.5"],
      ["South", "12"],
    ]);
  });
});
