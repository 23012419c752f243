import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import Database from "better-sqlite3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "../../../config/env.js";
import { largeCsv } from "../../../durability/large-csv.js";
import { readStoredInvariants } from "../../../durability/stored-invariants.js";
import { startApi, type ApiProcess } from "../../../test-support/api-process.js";
import { YIELD_CSV } from "../../../test-support/analysed-study.js";
import { HttpSession } from "../../../test-support/http-session.js";

/**
 * Two real server processes on one database file. Their sweepers race over runs left by an
 * instance that died; then one of them is killed with SIGKILL while it computes a request's run,
 * and the other takes the run up once the lease lapses and stores its one analysis.
 */
const TIMEOUT = 240_000;
/** Short leases so a dead instance's run is taken up within seconds (renewal at most half the lease). */
const RUN_ENV = {
  ANALYSIS_RUN_LEASE_SECONDS: "4",
  ANALYSIS_RUN_RENEW_SECONDS: "1",
  ANALYSIS_RUN_SWEEP_SECONDS: "0.5",
};

let dir: string;
let dbPath: string;
let a: ApiProcess;
let b: ApiProcess;
let analystA: HttpSession;
let analystId: number;

interface RunRow {
  id: number;
  study_id: number;
  status: string;
  claimed_by: string | null;
  attempts: number;
  analysis_id: number | null;
}

/** Reads the file directly, as a third party: the servers keep running. */
function query<T>(sql: string, ...params: unknown[]): T[] {
  const db = new Database(dbPath, { readonly: true, fileMustExist: true });
  try {
    return db.prepare(sql).all(...params) as T[];
  } finally {
    db.close();
  }
}

const sqliteTime = (d: Date) => d.toISOString().replace("T", " ").replace("Z", "");

async function until<T>(what: string, read: () => T | undefined, timeoutMs: number): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const got = read();
    if (got !== undefined) return got;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 5));
  }
}

async function study(levels: string[], factor: string, outcome: string): Promise<number> {
  const created = await analystA.json<{ study: { id: number } }>(
    "POST",
    "/api/studies",
    {
      title: "Runs taken up after an instance dies",
      objective: "Invented data for a two-instance test.",
      outcomeName: outcome,
      outcomeUnit: "units",
      factorName: factor,
      levels,
      context: "general",
    },
    201,
  );
  const id = created.study.id;
  await analystA.json(
    "PUT",
    `/api/studies/${id}/design`,
    {
      independence: "independent",
      scale: "continuous",
      question: "means",
      groupSizes: "equal",
      hasControl: "no",
      comparisons: "all-pairs",
      assignment: "randomized",
    },
    200,
  );
  await analystA.json("POST", `/api/studies/${id}/plan/lock`, undefined, 200);
  return id;
}

async function upload(studyId: number, csv: Buffer, fields: Record<string, string>): Promise<number> {
  const res = await analystA.upload(`/api/studies/${studyId}/datasets`, csv, "data.csv", fields);
  const body = (await res.json()) as { dataset: { id: number } };
  expect(res.status, JSON.stringify(body)).toBe(201);
  return body.dataset.id;
}

function expectConsistent(): void {
  const inv = readStoredInvariants(dbPath);
  expect(inv.integrity).toBe("ok");
  expect(inv.foreignKeyViolations).toBe(0);
  expect(inv.unreadableAnalyses).toEqual([]);
  expect(inv.runEventAnalysisIds).toEqual(inv.analysisIds);
}

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "waymark-runs-"));
  dbPath = path.join(dir, "waymark.sqlite");
  a = await startApi(dbPath, 60_000, RUN_ENV);
  b = await startApi(dbPath, 60_000, RUN_ENV);
  analystA = await HttpSession.signIn(a.url, "analyst@waymark.test", DEMO_PASSWORD);
  analystId = (await analystA.json<{ user: { id: number } }>("GET", "/api/auth/me", undefined, 200)).user.id;
}, TIMEOUT);

afterAll(async () => {
  await a?.kill();
  await b?.kill();
  fs.rmSync(dir, { recursive: true, force: true });
});

describe("analysis runs across two server processes on one database", () => {
  it(
    "both sweepers race over runs a dead instance left; each run stores one analysis",
    async () => {
      const studies: { studyId: number; datasetId: number }[] = [];
      for (let i = 0; i < 4; i++) {
        const studyId = await study(["North", "South", "East"], "Line", "Yield");
        const datasetId = await upload(studyId, Buffer.from(YIELD_CSV), {
          groupColumn: "Line",
          outcomeColumn: "Yield (g)",
        });
        studies.push({ studyId, datasetId });
      }
      const db = new Database(dbPath);
      db.pragma("busy_timeout = 5000");
      const insert = db.prepare(
        `INSERT INTO analysis_runs (study_id, dataset_id, request, requested_by_id, status, claimed_by, lease_until, attempts)
         VALUES (?, ?, '{}', ?, 'running', 'dead-instance', ?, 1)`,
      );
      const lapsed = sqliteTime(new Date(Date.now() - 60_000));
      const ids = studies.map((s) =>
        Number(insert.run(s.studyId, s.datasetId, analystId, lapsed).lastInsertRowid),
      );
      db.close();

      const runs = await until(
        "the sweepers to finish every run",
        () => {
          const rows = query<RunRow>(`SELECT * FROM analysis_runs WHERE id IN (${ids.join(",")})`);
          return rows.every((r) => r.status === "done" || r.status === "failed") ? rows : undefined;
        },
        60_000,
      );
      for (const run of runs) {
        expect(run).toMatchObject({ status: "done", claimed_by: null, attempts: 2 });
        const analyses = query<{ id: number }>(`SELECT id FROM analyses WHERE study_id = ?`, run.study_id);
        expect(analyses.map((x) => x.id)).toEqual([run.analysis_id]);
      }
      expectConsistent();
    },
    TIMEOUT,
  );

  it(
    "a run whose instance is killed mid-computation is finished by the other instance, once",
    async () => {
      const studyId = await study(["A", "B", "C"], "Group", "Value");
      const datasetId = await upload(studyId, largeCsv(1_000_000), {
        groupColumn: "Group",
        outcomeColumn: "Value",
      });
      const sent = analystA
        .request("POST", `/api/studies/${studyId}/analyses`, JSON.stringify({ datasetId }), {
          "content-type": "application/json",
        })
        .then(
          (r) => `answered ${r.status}`,
          (e: unknown) => `cut off (${e instanceof Error ? e.message : String(e)})`,
        );
      // Kill A as soon as its run is recorded: it then has the dataset and the engine still to go.
      const run = await until(
        "instance A to record its run",
        () => query<RunRow>(`SELECT * FROM analysis_runs WHERE study_id = ?`, studyId)[0],
        60_000,
      );
      await a.kill();
      console.log(`killed instance A holding run ${run.id} (${run.status}); the request was ${await sent}`);
      expect(run).toMatchObject({ status: "running", attempts: 1 });
      expect(run.claimed_by).toContain(`:${a.child.pid}:`);

      const done = await until(
        "instance B to take the run up and finish it",
        () => {
          const r = query<RunRow>(`SELECT * FROM analysis_runs WHERE id = ?`, run.id)[0]!;
          return r.status === "done" || r.status === "failed" ? r : undefined;
        },
        180_000,
      );
      expect(done).toMatchObject({ status: "done", attempts: 2, claimed_by: null });
      const analyses = query<{ id: number }>(`SELECT id FROM analyses WHERE study_id = ?`, studyId);
      expect(analyses.map((x) => x.id)).toEqual([done.analysis_id]);
      expectConsistent();
      // The analysis shows on the instance that survived, as it would to the web app's list.
      const analystB = await HttpSession.signIn(b.url, "analyst@waymark.test", DEMO_PASSWORD);
      const list = await analystB.json<{ analyses: { id: number }[] }>(
        "GET",
        `/api/studies/${studyId}/analyses`,
        undefined,
        200,
      );
      expect(list.analyses.map((x) => x.id)).toEqual([done.analysis_id]);
    },
    TIMEOUT,
  );
});
