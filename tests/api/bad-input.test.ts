import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import JSZip from "jszip";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { anon, signedIn } from "../../apps/api/src/test-support/agents.js";
import { lockedStudy } from "../../apps/api/src/test-support/locked-study.js";
import { makeTestApp } from "../../apps/api/src/test-support/test-app.js";
import { hostileCases } from "../fixtures/bad-input/generate-hostile.mjs";

const corpus = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../fixtures/bad-input");
let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await makeTestApp({ uploadLimitMb: 50 });
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
});
afterAll(async () => t.services.stop());

const datasetRows = async () => Number((await t.ds.query(`SELECT count(*) AS n FROM datasets`))[0].n);

/** Uploads bytes to a fresh locked study (levels North, South, East) and returns the response. */
async function upload(bytes: Buffer, name: string) {
  const id = await lockedStudy(analyst);
  return analyst
    .post(`/api/studies/${id}/datasets`)
    .field("groupColumn", "Line")
    .field("outcomeColumn", "Yield (g)")
    .attach("file", bytes, name);
}

// [file, expected status, what the message must name]; 201 means stored with a report that says what was left out.
const CASES: [string, number, RegExp][] = [
  ["empty.csv", 422, /empty/],
  ["header-only.csv", 422, /groups? with data/],
  ["binary-garbage.csv", 415, /binary data/],
  ["value-cells.csv", 422, /Row 18, column "Yield \(g\)": "1e309" is too large to hold/],
  ["wrong-delimiter.csv", 422, /"Line" is not in the file/],
  ["bom.csv", 201, /./],
  ["mixed-decimal-commas.csv", 422, /decimal comma/],
  ["nan-infinity.csv", 422, /"Infinity" is infinite/],
  ["one-group.csv", 422, /groups? with data|at least two/],
  ["group-of-one.csv", 422, /"South" has 1 usable value/],
  ["all-identical.csv", 201, /./],
  ["duplicated-headers.csv", 422, /appears more than once/],
  // Groups the plan does not name are refused, not dropped silently (the analyst may map them or leave them out).
  ["unknown-levels.csv", 422, /the plan does not name: "West", "Pilot"/],
  ["renamed-exe.xlsx", 415, /not an Excel workbook/],
  ["corrupt.xlsx", 422, /damaged/],
];

describe("the bad-input corpus (tests/fixtures/bad-input)", () => {
  it.each(CASES)(
    "%s → %i, with a message naming the problem when refused and nothing stored",
    async (file, status, message) => {
      const before = await datasetRows();
      const res = await upload(fs.readFileSync(path.join(corpus, file)), file);
      expect(res.status).toBe(status);
      if (status === 201) {
        expect(await datasetRows()).toBe(before + 1);
      } else {
        expect(res.body.error.message).toMatch(message);
        expect(await datasetRows()).toBe(before);
      }
      // The file's own "NaN" text may be quoted back (in the report, or in quotes in a message); nothing else may be.
      expect(
        JSON.stringify(res.body)
          .replace(/"value":"[^"]*"/g, "")
          .replace(/\\"[^"\\]*\\"/g, ""),
      ).not.toMatch(/NaN|Infinity|undefined|\[object/);
    },
  );

  it("refuses 10,000 columns and more than 2,000,000 rows, and keeps serving meanwhile", async () => {
    const wide = Buffer.from(
      `${Array.from({ length: 10_000 }, (_, i) => `c${i}`).join(",")}\n${"1,".repeat(9_999)}1\n`,
    );
    const w = await upload(wide, "wide.csv");
    expect(w.status).toBe(422);
    expect(w.body.error.message).toMatch(/at most 1000/);

    const lines = ["Line,Yield (g)"];
    for (let i = 0; i < 2_000_001; i++)
      lines.push(i % 3 === 0 ? "North,1.5" : i % 3 === 1 ? "South,2.5" : "East,3.5");
    const tall = Buffer.from(lines.join("\n"));
    const rssBefore = process.memoryUsage().rss;
    const [res, health] = await Promise.all([
      upload(tall, "tall.csv"),
      (await anon(t.app)).get("/api/health"),
    ]);
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/more than 2,000,000 data rows/);
    expect(health.status).toBe(200);
    // A figure for the record, not a timing or memory assertion.
    console.log(
      `2,000,001-row upload (${(tall.length / 1e6).toFixed(1)} MB): RSS grew by ${((process.memoryUsage().rss - rssBefore) / 1e6).toFixed(0)} MB`,
    );
  }, 120_000);

  it("refuses a zip bomb whose central directory claims 3.9 GB before inflating it", async () => {
    const zip = new JSZip();
    zip.file("[Content_Types].xml", "<Types/>");
    zip.file("xl/worksheets/sheet1.xml", "0".repeat(1024 * 1024));
    const bytes = await zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE" });
    // Declare a 3.9 GB sheet in the central directory, as a bomb's header would.
    let p = bytes.readUInt32LE(bytes.length - 22 + 16);
    for (let n = 0; n < 2; n++) {
      bytes.writeUInt32LE(0xf0000000, p + 24);
      p += 46 + bytes.readUInt16LE(p + 28) + bytes.readUInt16LE(p + 30) + bytes.readUInt16LE(p + 32);
    }
    const res = await upload(bytes, "bomb.xlsx");
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/would expand to more than 100 MB/);
  });

  it("refuses every generated hostile case (generate-hostile.mjs) with its cause, stores nothing, keeps serving", async () => {
    // The 2,000,001-row case is the test above; the 6-million-cell workbook is shrunk to 1.8 million cells.
    const cases = (await hostileCases({ scale: 0.3 })).filter((c) => c.file !== "tall.csv");
    const failures: string[] = [];
    for (const c of cases) {
      const before = await datasetRows();
      const [res, health] = await Promise.all([
        upload(c.bytes, c.file),
        (await anon(t.app)).get("/api/health"),
      ]);
      const body = JSON.stringify(res.body);
      const problems = [
        res.status !== c.status && `status ${res.status}, expected ${c.status}`,
        !new RegExp(c.message).test(res.body.error?.message ?? "") && `message ${body.slice(0, 300)}`,
        (await datasetRows()) !== before && "a dataset was stored",
        health.status !== 200 && `health answered ${health.status}`,
        body.length > 4000 && `a ${body.length}-character answer`,
      ].filter(Boolean);
      if (problems.length) failures.push(`${c.name} (finding ${c.finding}): ${problems.join("; ")}`);
    }
    expect(failures).toEqual([]);
  }, 300_000);

  it("strips folders from an uploaded file name (path traversal)", async () => {
    const res = await upload(fs.readFileSync(path.join(corpus, "bom.csv")), "../../etc/passwd.csv");
    expect(res.status).toBe(201);
    expect(res.body.dataset.fileName).toBe("passwd.csv");
  });
});
