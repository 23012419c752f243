import { createHash } from "node:crypto";
import ExcelJS from "exceljs";
import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../../test-support/agents.js";
import { lockedStudy } from "../../test-support/locked-study.js";
import { makeTestApp } from "../../test-support/test-app.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let writer: Awaited<ReturnType<typeof signedIn>>;

const GOOD = [
  '"Line","Yield (g)"',
  "North,10.1",
  "North,11.3",
  "North,9.8",
  "South,12.0",
  "South,",
  "South,12.9",
  "South,13.4",
  "East,10.9",
  "East,abc",
  "East,11.8",
  "East,10.2",
  "West,9.0",
].join("\n");

beforeAll(async () => {
  t = await makeTestApp();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  writer = await signedIn(t.app, "writer", t.env.demoPassword);
});

const datasetRows = async () => Number((await t.ds.query(`SELECT count(*) AS n FROM datasets`))[0].n);

describe("dataset upload", () => {
  it("refuses an upload before the plan is locked (409)", async () => {
    const { body } = await analyst
      .post("/api/studies")
      .send({
        title: "Unlocked",
        objective: "x",
        outcomeName: "y",
        outcomeUnit: "",
        factorName: "f",
        levels: ["a", "b"],
        context: "general",
      })
      .expect(201);
    const res = await analyst
      .post(`/api/studies/${body.study.id}/datasets`)
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .attach("file", Buffer.from(GOOD), "y.csv")
      .expect(409);
    expect(res.body.error.code).toBe("plan_not_locked");
  });

  it("stores a version with its SHA-256 and a report of every excluded row and unknown level", async () => {
    const id = await lockedStudy(analyst);
    const preview = await analyst
      .post(`/api/studies/${id}/datasets/preview`)
      .attach("file", Buffer.from(GOOD), "yield.csv")
      .expect(200);
    expect(preview.body.guess).toEqual({ layout: "long", groupColumn: "Line", outcomeColumn: "Yield (g)" });
    const res = await analyst
      .post(`/api/studies/${id}/datasets`)
      .field("layout", "long")
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .field("levelMap", JSON.stringify({ West: null })) // the unplanned group is left out on purpose
      .attach("file", Buffer.from(GOOD), "yield.csv")
      .expect(201);
    const d = res.body.dataset;
    expect(d).toMatchObject({
      version: 1,
      fileName: "yield.csv",
      sizeBytes: Buffer.byteLength(GOOD),
      afterPlanLock: true,
    });
    expect(d.sha256).toBe(createHash("sha256").update(GOOD).digest("hex"));
    expect(d.report).toMatchObject({ rowsRead: 12, rowsUsed: 9, unknownLevels: ["West"], missingLevels: [] });
    // Row numbers as a spreadsheet shows them: the header is row 1.
    expect(d.report.excluded.map((e: { row: number; reason: string }) => [e.row, e.reason])).toEqual([
      [6, "missing"],
      [10, "non-numeric"],
      [13, "unknown-level"],
    ]);
    expect(d.report.groupsFound).toEqual([
      { name: "North", n: 3 },
      { name: "South", n: 3 },
      { name: "East", n: 3 },
    ]);
    const again = await analyst
      .post(`/api/studies/${id}/datasets`)
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .field("levelMap", JSON.stringify({ West: null }))
      .attach("file", Buffer.from(GOOD), "yield-v2.csv")
      .expect(201);
    expect(again.body.dataset.version).toBe(2);
    // Writers see approved studies only; the analyst lists the draft's versions.
    await writer.get(`/api/studies/${id}/datasets`).expect(403);
    const list = await analyst.get(`/api/studies/${id}/datasets`).expect(200);
    expect(list.body.datasets.map((x: { version: number }) => x.version)).toEqual([2, 1]);
  });

  it("reads the wide layout and XLSX workbooks", async () => {
    const id = await lockedStudy(analyst);
    const wb = new ExcelJS.Workbook();
    const sh = wb.addWorksheet("data");
    sh.addRow(["North", "South", "East"]);
    sh.addRow([1.5, 2.5, 3.25]);
    sh.addRow([1.75, 2.0, 3.5]);
    sh.addRow([1.25, null, 3.0]);
    const buf = Buffer.from(await wb.xlsx.writeBuffer());
    const res = await analyst
      .post(`/api/studies/${id}/datasets`)
      .field("layout", "wide")
      .attach("file", buf, "wide.xlsx")
      .expect(201);
    expect(res.body.dataset.report.groupsFound).toEqual([
      { name: "North", n: 3 },
      { name: "South", n: 2 },
      { name: "East", n: 3 },
    ]);
  });

  const bad: [string, string | Buffer, string, number, RegExp][] = [
    ["an empty file", "", "empty.csv", 422, /empty/],
    [
      "a header without data",
      '"Line","Yield (g)"\n',
      "header.csv",
      422,
      /at least two|no data|groups? with data/i,
    ],
    ["binary garbage named .csv", Buffer.from([0x00, 0x01, 0xff, 0x10, 0x00]), "junk.csv", 415, /binary/],
    [
      "a program renamed .xlsx",
      Buffer.from("MZ\x90\x00 this is not a workbook"),
      "setup.xlsx",
      415,
      /not an Excel workbook/,
    ],
    [
      "a corrupt workbook",
      Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), Buffer.alloc(64, 7)]),
      "broken.xlsx",
      422,
      /could not be read/,
    ],
    ["a PDF", Buffer.from("%PDF-1.7"), "paper.pdf", 415, /reads \.csv and \.xlsx/],
    [
      "one group only",
      "Line,Yield (g)\nNorth,1\nNorth,2\n",
      "one.csv",
      422,
      /groups? with data|at least two/,
    ],
    [
      "a group of size 1",
      "Line,Yield (g)\nNorth,1\nNorth,2\nSouth,3\n",
      "tiny.csv",
      422,
      /"South" has 1 usable value/,
    ],
    ["duplicated header names", "Line,Line\nNorth,1\n", "dup.csv", 422, /appears more than once/],
    [
      "a column that is not there",
      "Group,Value\nNorth,1\nNorth,2\nSouth,3\nSouth,4\n",
      "cols.csv",
      422,
      /not in the file/,
    ],
  ];

  it.each(bad)(
    "refuses %s with the right status and stores nothing",
    async (_what, content, name, status, message) => {
      const id = await lockedStudy(analyst);
      const before = await datasetRows();
      const res = await analyst
        .post(`/api/studies/${id}/datasets`)
        .field("groupColumn", "Line")
        .field("outcomeColumn", "Yield (g)")
        .attach("file", typeof content === "string" ? Buffer.from(content) : content, name)
        .expect(status);
      expect(res.body.error.message).toMatch(message);
      expect(await datasetRows()).toBe(before);
      await request(t.app).get("/api/health").expect(200);
    },
  );

  it("reads a semicolon-delimited file with a byte-order mark, and lists NaN text as missing, as the command line does", async () => {
    const id = await lockedStudy(analyst);
    const csv =
      "\uFEFFLine;Yield (g)\nNorth;10.5\nNorth;11\nNorth;NaN\nSouth;12\nSouth;12.5\nEast;9\nEast;9.5\n";
    const res = await analyst
      .post(`/api/studies/${id}/datasets`)
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .attach("file", Buffer.from(csv), "semi.csv")
      .expect(201);
    expect(res.body.dataset.report.groupsFound).toEqual([
      { name: "North", n: 2 },
      { name: "South", n: 2 },
      { name: "East", n: 2 },
    ]);
    expect(res.body.dataset.report.excluded).toEqual([
      { row: 4, reason: "missing", value: "NaN", column: "Yield (g)" },
    ]);
  });

  it("stores all-identical values and says which tests cannot run, without NaN", async () => {
    const id = await lockedStudy(analyst);
    const csv = "Line,Yield (g)\nNorth,5\nNorth,5\nSouth,5\nSouth,5\nEast,5\nEast,5\n";
    const up = await analyst
      .post(`/api/studies/${id}/datasets`)
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .attach("file", Buffer.from(csv), "same.csv")
      .expect(201);
    const checks = await analyst.get(`/api/studies/${id}/datasets/${up.body.dataset.id}/checks`).expect(200);
    expect(checks.body.checks.anova.available).toBe(false);
    expect(checks.body.checks.warnings.join(" ")).toMatch(/identical/);
    expect(JSON.stringify(checks.body)).not.toMatch(/NaN|Infinity|null,"reason":undefined/);
  });

  it("refuses a file above the size limit with 413", async () => {
    const id = await lockedStudy(analyst);
    const big = Buffer.alloc(t.env.UPLOAD_LIMIT_MB * 1024 * 1024 + 10, 0x31);
    const res = await analyst
      .post(`/api/studies/${id}/datasets`)
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .attach("file", big, "big.csv");
    expect(res.status).toBe(413);
  });

  it("keeps stored datasets immutable at the database level", async () => {
    await expect(t.ds.query(`UPDATE datasets SET file_name = 'x'`)).rejects.toThrow(/immutable/);
  });
});
