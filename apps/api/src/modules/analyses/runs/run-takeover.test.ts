import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { DataSource } from "typeorm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "../../../config/env.js";
import { ENTITY_DRIVER } from "../../../db/column-types.js";
import { openDatabase } from "../../../db/data-source.js";
import { largeCsv } from "../../../durability/large-csv.js";
import { startApi, type ApiProcess } from "../../../test-support/api-process.js";
import { YIELD_CSV } from "../../../test-support/analysed-study.js";
import { HttpSession } from "../../../test-support/http-session.js";
import { sql } from "../../../test-support/sql.js";
import { closeTestDatabase, openTestDatabase } from "../../../test-support/test-database.js";
import { AuditEvent } from "../../audit/audit-event.entity.js";
import { AnalysisRun } from "./analysis-run.entity.js";
import { FIXTURE_DESIGN } from "../../../test-support/locked-study.js";

/**
 * Two real server processes on one database: a SQLite file, or with WAYMARK_TEST_DB=postgres a
 * fresh PostgreSQL database (claims there use SELECT … FOR UPDATE SKIP LOCKED). Their sweepers
 * race over runs left by an instance that died; then one of them is killed with SIGKILL while it
 * computes a request's run, and the other takes the run up once the lease lapses and stores its
 * one analysis. The test reads and writes the database through a connection of its own.
 */
const TIMEOUT = 240_000;
/** Short leases so a dead instance's run is taken up within seconds (renewal at most half the lease). */
const RUN_ENV = {
  ANALYSIS_RUN_LEASE_SECONDS: "4",
  ANALYSIS_RUN_RENEW_SECONDS: "1",
  ANALYSIS_RUN_SWEEP_SECONDS: "0.5",
};

let dir: string;
/** The test's own connection to the database both servers use. */
let db: DataSource;
let target: string;
let a: ApiProcess;
let b: ApiProcess;
let analystA: HttpSession;
let analystId: number;

const runsOf = (where: string, params: Record<string, unknown>) =>
  sql<{
    id: number;
    study_id: number;
    status: string;
    claimed_by: string | null;
    attempts: number;
    analysis_id: number | null;
  }>(
    db,
    `SELECT id, study_id, status, claimed_by, attempts, analysis_id FROM analysis_runs WHERE ${where} ORDER BY id`,
    params,
  ).then((rows) =>
    rows.map((r) => ({
      ...r,
      id: Number(r.id),
      study_id: Number(r.study_id),
      attempts: Number(r.attempts),
      analysis_id: r.analysis_id === null ? null : Number(r.analysis_id),
    })),
  );

const analysisIdsOf = async (studyId: number) =>
  (
    await sql<{ id: number }>(db, `SELECT id FROM analyses WHERE study_id = :studyId ORDER BY id`, {
      studyId,
    })
  ).map((r) => Number(r.id));

async function until<T>(what: string, read: () => Promise<T | undefined>, timeoutMs: number): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const got = await read();
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
  await analystA.json("PUT", `/api/studies/${id}/design`, FIXTURE_DESIGN, 200);
  await analystA.json("POST", `/api/studies/${id}/plan/lock`, undefined, 200);
  return id;
}

async function upload(studyId: number, csv: Buffer, fields: Record<string, string>): Promise<number> {
  const res = await analystA.upload(`/api/studies/${studyId}/datasets`, csv, "data.csv", fields);
  const body = (await res.json()) as { dataset: { id: number } };
  expect(res.status, JSON.stringify(body)).toBe(201);
  return body.dataset.id;
}

/** Every analysis paired one-to-one with the "analysis.run" event written in its transaction. */
async function expectOneEventPerAnalysis(): Promise<void> {
  const analyses = (await sql<{ id: number }>(db, `SELECT id FROM analyses ORDER BY id`)).map((r) =>
    Number(r.id),
  );
  const events = (await db.getRepository(AuditEvent).findBy({ action: "analysis.run" }))
    .map((e) => (e.after as { analysisId: number }).analysisId)
    .sort((x, y) => x - y);
  expect(events).toEqual(analyses);
}

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "waymark-runs-"));
  if (ENTITY_DRIVER === "postgres") {
    const opened = await openTestDatabase();
    db = opened.ds;
    target = opened.url!;
  } else {
    target = path.join(dir, "waymark.sqlite");
    db = await openDatabase(target);
  }
  a = await startApi(target, 60_000, RUN_ENV);
  b = await startApi(target, 60_000, RUN_ENV);
  analystA = await HttpSession.signIn(a.url, "analyst@waymark.test", DEMO_PASSWORD);
  analystId = (await analystA.json<{ user: { id: number } }>("GET", "/api/auth/me", undefined, 200)).user.id;
}, TIMEOUT);

afterAll(async () => {
  await a?.kill();
  await b?.kill();
  if (db) await closeTestDatabase(db);
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
      const repo = db.getRepository(AnalysisRun);
      const inserted = await repo.save(
        studies.map((x) =>
          repo.create({
            studyId: x.studyId,
            datasetId: x.datasetId,
            request: {},
            requestedById: analystId,
            requestedFromIp: null,
            status: "running",
            claimedBy: "dead-instance",
            leaseUntil: new Date(Date.now() - 60_000),
            attempts: 1,
          }),
        ),
      );
      const ids = inserted.map((r) => r.id);

      const runs = await until(
        "the sweepers to finish every run",
        async () => {
          const rows = await runsOf(`id IN (:...ids)`, { ids });
          return rows.every((r) => r.status === "done" || r.status === "failed") ? rows : undefined;
        },
        60_000,
      );
      for (const run of runs) {
        expect(run).toMatchObject({ status: "done", claimed_by: null, attempts: 2 });
        expect(await analysisIdsOf(run.study_id)).toEqual([run.analysis_id]);
      }
      await expectOneEventPerAnalysis();
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
        async () => (await runsOf(`study_id = :studyId`, { studyId }))[0],
        60_000,
      );
      await a.kill();
      console.log(`killed instance A holding run ${run.id} (${run.status}); the request was ${await sent}`);
      expect(run).toMatchObject({ status: "running", attempts: 1 });
      expect(run.claimed_by).toContain(`:${a.child.pid}:`);

      const done = await until(
        "instance B to take the run up and finish it",
        async () => {
          const [r] = await runsOf(`id = :id`, { id: run.id });
          return r!.status === "done" || r!.status === "failed" ? r : undefined;
        },
        180_000,
      );
      expect(done).toMatchObject({ status: "done", attempts: 2, claimed_by: null });
      expect(await analysisIdsOf(studyId)).toEqual([done.analysis_id]);
      await expectOneEventPerAnalysis();
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
