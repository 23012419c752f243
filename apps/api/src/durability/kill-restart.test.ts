import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import Database from "better-sqlite3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "../config/env.js";
import { ENTITY_DRIVER } from "../db/column-types.js";
import { startApi, type ApiProcess } from "../test-support/api-process.js";
import { HttpSession } from "../test-support/http-session.js";
import { largeCsv } from "./large-csv.js";
import { readStoredInvariants } from "./stored-invariants.js";
import { FIXTURE_DESIGN } from "../test-support/locked-study.js";

/**
 * Kills the real server process with SIGKILL in the middle of a large upload and of an
 * analysis, restarts it on the same file and checks nothing half-written survived, and that the
 * analysis run the kill cut off is taken up again by the restarted server. To land the
 * kill while the request is writing, not merely parsing or computing, the test empties the WAL
 * first and kills as soon as it grows (a 10 MB dataset spills pages into the WAL before its
 * commit). Whether the kill then falls before or after the commit varies with the machine, so
 * the checks hold either way: a crash may lose the request, never leave part of it.
 */
const TIMEOUT = 180_000;
const ROWS = 1_000_000;
const UPLOAD_FIELDS = { groupColumn: "Group", outcomeColumn: "Value" };

let dir: string;
let dbPath: string;
let api: ApiProcess;
let analyst: HttpSession;
let studyId: number;
let datasetId: number;
const csv = largeCsv(ROWS);

async function restart(): Promise<void> {
  api = await startApi(dbPath);
  analyst = await HttpSession.signIn(api.url, "analyst@waymark.test", DEMO_PASSWORD);
}

const walBytes = () => (fs.existsSync(`${dbPath}-wal`) ? fs.statSync(`${dbPath}-wal`).size : 0);

/** Moves everything into the main file and empties the WAL, so the next write shows as growth. */
function emptyWal(): void {
  const db = new Database(dbPath);
  db.pragma("wal_checkpoint(TRUNCATE)");
  db.close();
}

/**
 * Sends a request and SIGKILLs the server once the WAL grew by at least `walAtLeast` bytes since
 * `armed()` first held (at once by default), or after `giveUpMs` if it never does; reports when
 * the kill fell and how far the request got.
 */
async function killWhileWriting(
  send: () => Promise<Response>,
  walAtLeast: number,
  giveUpMs: number,
  armed: () => boolean = () => true,
): Promise<string> {
  emptyWal();
  let answered = false;
  const pending = send().then(
    (r) => ((answered = true), `answered ${r.status} before the kill`),
    (e: unknown) => `cut off (${e instanceof Error ? e.message : String(e)})`,
  );
  const t0 = performance.now();
  const waiting = () => !answered && performance.now() - t0 < giveUpMs;
  while (!armed() && waiting()) await new Promise((r) => setTimeout(r, 2));
  const from = walBytes();
  while (walBytes() - from < walAtLeast && waiting()) await new Promise((r) => setTimeout(r, 2));
  const at = `${walBytes()} WAL bytes at ${(performance.now() - t0).toFixed(0)} ms`;
  await api.kill();
  return `killed with ${at}: ${await pending}`;
}

interface RunRow {
  id: number;
  status: string;
}

/** The newest analysis run, read straight from the file while the server runs. */
function latestRun(): RunRow | undefined {
  const db = new Database(dbPath, { readonly: true, fileMustExist: true });
  try {
    return db.prepare(`SELECT id, status FROM analysis_runs ORDER BY id DESC LIMIT 1`).get() as
      RunRow | undefined;
  } finally {
    db.close();
  }
}

async function runEnded(id: number): Promise<RunRow> {
  const deadline = Date.now() + 120_000;
  for (;;) {
    const db = new Database(dbPath, { readonly: true, fileMustExist: true });
    const row = db.prepare(`SELECT id, status FROM analysis_runs WHERE id = ?`).get(id) as RunRow;
    db.close();
    if (row.status === "done" || row.status === "failed" || Date.now() > deadline) return row;
    await new Promise((r) => setTimeout(r, 100));
  }
}

function expectConsistent(inv: ReturnType<typeof readStoredInvariants>): void {
  expect(inv.integrity).toBe("ok");
  expect(inv.foreignKeyViolations).toBe(0);
  expect(inv.brokenDatasets).toEqual([]);
  expect(inv.uploadEventDatasetIds).toEqual(inv.datasetIds);
  expect(inv.unreadableAnalyses).toEqual([]);
  expect(inv.runEventAnalysisIds).toEqual(inv.analysisIds);
}

const timed = async <T>(f: () => Promise<T>): Promise<[T, number]> => {
  const t0 = performance.now();
  const out = await f();
  return [out, performance.now() - t0];
};

// The kill lands while SQLite's file is being written, and the checks read that file: this is the
// embedded database's test. On PostgreSQL, durability across a killed instance is the server's
// (its write-ahead log), and the two-instance test kills an instance mid-work.
describe.skipIf(ENTITY_DRIVER === "postgres")("a server killed mid-request leaves a sound database", () => {
  beforeAll(async () => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "waymark-durability-"));
    dbPath = path.join(dir, "waymark.sqlite");
    await restart();
    const created = await analyst.json<{ study: { id: number } }>(
      "POST",
      "/api/studies",
      {
        title: "Durability under a killed process",
        objective: "Invented data for a crash test.",
        outcomeName: "Value",
        outcomeUnit: "units",
        factorName: "Group",
        levels: ["A", "B", "C"],
        context: "general",
      },
      201,
    );
    studyId = created.study.id;
    await analyst.json("PUT", `/api/studies/${studyId}/design`, FIXTURE_DESIGN, 200);
    await analyst.json("POST", `/api/studies/${studyId}/plan/lock`, undefined, 200);
  }, TIMEOUT);

  afterAll(async () => {
    await api?.kill();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it(
    "a large upload cut off by SIGKILL leaves no partial dataset and an audit trail that matches",
    async () => {
      const upload = () =>
        analyst.upload(`/api/studies/${studyId}/datasets`, csv, "large.csv", UPLOAD_FIELDS);
      const [first, ms] = await timed(upload);
      const body = (await first.json()) as { dataset: { id: number } };
      expect(first.status, JSON.stringify(body)).toBe(201);
      datasetId = body.dataset.id;

      const outcome = await killWhileWriting(upload, 1 << 20, 3 * ms);
      console.log(`upload of ${(csv.length / 1e6).toFixed(1)} MB took ${ms.toFixed(0)} ms; ${outcome}`);
      expectConsistent(readStoredInvariants(dbPath));

      await restart();
      const list = await analyst.json<{ datasets: { id: number }[] }>(
        "GET",
        `/api/studies/${studyId}/datasets`,
        undefined,
        200,
      );
      expect(list.datasets.map((d) => d.id)).toContain(datasetId);
      expectConsistent(readStoredInvariants(dbPath));
    },
    TIMEOUT,
  );

  it(
    "an analysis cut off by SIGKILL leaves no partial analysis, and runs again after the restart",
    async () => {
      const run = () =>
        analyst.request("POST", `/api/studies/${studyId}/analyses`, JSON.stringify({ datasetId }), {
          "content-type": "application/json",
        });
      const [first, ms] = await timed(run);
      expect(first.status, await first.text()).toBe(201);

      // The request first records its run (analysis_runs), then computes. Waiting for that row and
      // then for one more whole WAL frame (24 + 4096 bytes) puts this kill inside the result's
      // write transaction or just after its commit.
      const lastRun = latestRun()?.id ?? 0;
      const outcome = await killWhileWriting(run, 24 + 4096, 3 * ms, () => (latestRun()?.id ?? 0) > lastRun);
      console.log(`analysis of ${ROWS} values took ${ms.toFixed(0)} ms; ${outcome}`);
      expectConsistent(readStoredInvariants(dbPath));
      const analysesBeforeKill = readStoredInvariants(dbPath).analysisIds.length;
      const killed = latestRun()!;
      expect(killed.id).toBeGreaterThan(lastRun);
      // The killed instance's lease would lapse within 30 s; the test moves it into the past.
      const db = new Database(dbPath);
      db.prepare(`UPDATE analysis_runs SET lease_until = '2000-01-01 00:00:00.000' WHERE id = ?`).run(
        killed.id,
      );
      db.close();

      await restart();
      // A run cut off before its commit is taken up by the restarted server's sweeper and stores
      // one analysis; a run that committed before the kill is left as it is.
      const ended = await runEnded(killed.id);
      expect(ended.status).toBe("done");
      expect(readStoredInvariants(dbPath).analysisIds.length).toBe(
        analysesBeforeKill + (killed.status === "done" ? 0 : 1),
      );
      const health = await analyst.request("GET", "/api/health");
      expect(health.status).toBe(200);
      const before = readStoredInvariants(dbPath).analysisIds.length;
      const again = await run();
      expect(again.status, await again.clone().text()).toBe(201);
      const inv = readStoredInvariants(dbPath);
      expectConsistent(inv);
      expect(inv.analysisIds.length).toBe(before + 1);
    },
    TIMEOUT,
  );
});
