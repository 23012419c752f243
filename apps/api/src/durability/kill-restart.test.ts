import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "../config/env.js";
import { startApi, type ApiProcess } from "../test-support/api-process.js";
import { HttpSession } from "../test-support/http-session.js";
import { largeCsv } from "./large-csv.js";
import { readStoredInvariants } from "./stored-invariants.js";

/**
 * Kills the real server process with SIGKILL in the middle of a large upload and of an
 * analysis, restarts it on the same file and checks nothing half-written survived. The kill
 * lands at half the time the same request took when left to finish; whether it then falls
 * before or after the commit varies with the machine, so the checks hold either way: a crash
 * may lose the request, never leave part of it.
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

/** Sends a request, SIGKILLs the server `afterMs` later and reports how far the request got. */
async function killDuring(send: () => Promise<Response>, afterMs: number): Promise<string> {
  const pending = send().then(
    (r) => `answered ${r.status} before the kill`,
    (e: unknown) => `cut off (${e instanceof Error ? e.message : String(e)})`,
  );
  await new Promise((r) => setTimeout(r, afterMs));
  await api.kill();
  return pending;
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
  await analyst.json(
    "PUT",
    `/api/studies/${studyId}/design`,
    { independence: "independent", scale: "continuous", hasControl: "no", comparisons: "all-pairs", assignment: "randomized" },
    200,
  );
  await analyst.json("POST", `/api/studies/${studyId}/plan/lock`, undefined, 200);
}, TIMEOUT);

afterAll(async () => {
  await api?.kill();
  fs.rmSync(dir, { recursive: true, force: true });
});

describe("a server killed mid-request leaves a sound database", () => {
  it("a large upload cut off by SIGKILL leaves no partial dataset and an audit trail that matches", async () => {
    const upload = () => analyst.upload(`/api/studies/${studyId}/datasets`, csv, "large.csv", UPLOAD_FIELDS);
    const [first, ms] = await timed(upload);
    const body = (await first.json()) as { dataset: { id: number } };
    expect(first.status, JSON.stringify(body)).toBe(201);
    datasetId = body.dataset.id;

    const outcome = await killDuring(upload, ms / 2);
    console.log(`upload of ${(csv.length / 1e6).toFixed(1)} MB took ${ms.toFixed(0)} ms; killed at ${(ms / 2).toFixed(0)} ms: ${outcome}`);
    expectConsistent(readStoredInvariants(dbPath));

    await restart();
    const list = await analyst.json<{ datasets: { id: number }[] }>("GET", `/api/studies/${studyId}/datasets`, undefined, 200);
    expect(list.datasets.map((d) => d.id)).toContain(datasetId);
    expectConsistent(readStoredInvariants(dbPath));
  }, TIMEOUT);

  it("an analysis cut off by SIGKILL leaves no partial analysis, and runs again after the restart", async () => {
    const run = () =>
      analyst.request("POST", `/api/studies/${studyId}/analyses`, JSON.stringify({ datasetId }), {
        "content-type": "application/json",
      });
    const [first, ms] = await timed(run);
    expect(first.status, await first.text()).toBe(201);

    const outcome = await killDuring(run, ms / 2);
    console.log(`analysis of ${ROWS} values took ${ms.toFixed(0)} ms; killed at ${(ms / 2).toFixed(0)} ms: ${outcome}`);
    expectConsistent(readStoredInvariants(dbPath));

    await restart();
    const health = await fetch(`${api.url}/api/health`);
    expect(health.status).toBe(200);
    const before = readStoredInvariants(dbPath).analysisIds.length;
    const again = await run();
    expect(again.status, await again.clone().text()).toBe(201);
    const inv = readStoredInvariants(dbPath);
    expectConsistent(inv);
    expect(inv.analysisIds.length).toBe(before + 1);
  }, TIMEOUT);
});
