import type { DataSource } from "typeorm";
import { beforeAll, describe, expect, it } from "vitest";
import { holdAt } from "../../../db/pause-points.js";
import { signedIn } from "../../../test-support/agents.js";
import { analysedStudy } from "../../../test-support/analysed-study.js";
import { makeTestApp } from "../../../test-support/test-app.js";
import { AuditEvent } from "../../audit/audit-event.entity.js";
import { Analysis } from "../analysis.entity.js";
import { runEngine, type AnalysisEngine } from "../analysis.service.js";
import { AnalysisRun } from "./analysis-run.entity.js";
import { AnalysisRunner, type RunSettings } from "./analysis-runner.js";

/**
 * Runs as leased rows (common practice for work queues on a shared database). A dead instance is
 * simulated by a run row claimed by "dead-instance" whose lease lies in the past; racing instances
 * by several runners on one data source. Real processes on one database file: run-takeover.test.ts.
 */
let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;

/** No heartbeat during a test (renewal every minute), so a test decides when leases lapse. */
const SETTINGS: RunSettings = {
  leaseMs: 30_000,
  renewMs: 60_000,
  sweepMs: 60_000,
  maxAttempts: 3,
  sweepConcurrency: 2,
  waitMs: 20_000,
};
const runner = (name: string, ds: DataSource = t.ds, engine: AnalysisEngine = runEngine) =>
  new AnalysisRunner(ds, SETTINGS, engine, name);

beforeAll(async () => {
  t = await makeTestApp();
  // The app's own sweeper would race the runners these tests start; requests still use it.
  t.analysisRuns.stopSweeping();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
});

/** A study with one stored analysis, and a run of its plan left behind by an instance that died. */
async function deadRun(o: { attempts?: number; claimedBy?: string; leaseMs?: number } = {}) {
  const { studyId, datasetId } = await analysedStudy(analyst);
  const run = await t.ds.getRepository(AnalysisRun).save(
    t.ds.getRepository(AnalysisRun).create({
      studyId,
      datasetId,
      request: {},
      requestedById: (await analyst.get("/api/auth/me").expect(200)).body.user.id,
      requestedFromIp: "127.0.0.1",
      status: "running",
      claimedBy: o.claimedBy ?? "dead-instance",
      leaseUntil: new Date(Date.now() + (o.leaseMs ?? -60_000)),
      attempts: o.attempts ?? 1,
    }),
  );
  return { studyId, datasetId, runId: run.id };
}

const runRow = (ds: DataSource, id: number) => ds.getRepository(AnalysisRun).findOneByOrFail({ id });
const analysesOf = (ds: DataSource, studyId: number) =>
  ds.getRepository(Analysis).find({ where: { studyId }, order: { id: "ASC" } });
const runEvents = async (ds: DataSource, studyId: number) =>
  (await ds.getRepository(AuditEvent).findBy({ studyId, action: "analysis.run" })).map(
    (e) => (e.after as { analysisId: number }).analysisId,
  );

/** A gate the first run to reach it waits at; later arrivals pass straight through. */
function firstArrivalGate() {
  let release!: () => void;
  let arrived!: () => void;
  const opened = new Promise<void>((r) => (release = r));
  const reached = new Promise<void>((r) => (arrived = r));
  let first = true;
  const wait = () => {
    if (!first) return Promise.resolve();
    first = false;
    arrived();
    return opened;
  };
  return { wait, release, reached };
}

describe("a run whose instance died is taken up again", () => {
  it("a sweeper finishes a run whose lease lapsed, exactly once, with its audit event", async () => {
    const { studyId, runId } = await deadRun();
    const b = runner("instance-b");
    await b.sweepOnce();
    const run = await runRow(t.ds, runId);
    expect(run).toMatchObject({ status: "done", claimedBy: null, leaseUntil: null, attempts: 2 });
    const analyses = await analysesOf(t.ds, studyId);
    expect(analyses).toHaveLength(2); // the study's first analysis, and the run's
    expect(run.analysisId).toBe(analyses[1]!.id);
    expect((await runEvents(t.ds, studyId)).sort()).toEqual(analyses.map((a) => a.id));
    // Sweeping again, here or on another instance, takes nothing.
    await b.sweepOnce();
    await runner("instance-c").sweepOnce();
    expect(await analysesOf(t.ds, studyId)).toHaveLength(2);
  });

  it("a run under a live lease is left to the instance that holds it", async () => {
    const { studyId, runId } = await deadRun({ claimedBy: "live-instance", leaseMs: 60_000 });
    await runner("instance-b").sweepOnce();
    expect(await runRow(t.ds, runId)).toMatchObject({ status: "running", claimedBy: "live-instance" });
    expect(await analysesOf(t.ds, studyId)).toHaveLength(1);
  });

  it("two sweepers racing over the same runs store one analysis per run", async () => {
    const dead = await Promise.all([deadRun(), deadRun(), deadRun()]);
    const [a, b] = [runner("instance-a"), runner("instance-b")];
    await Promise.all([a.sweepOnce(), b.sweepOnce(), a.sweepOnce(), b.sweepOnce()]);
    await Promise.all([a.sweepOnce(), b.sweepOnce()]);
    for (const { studyId, runId } of dead) {
      const run = await runRow(t.ds, runId);
      expect(run.status).toBe("done");
      const analyses = await analysesOf(t.ds, studyId);
      expect(analyses.map((x) => x.id)).toEqual([analyses[0]!.id, run.analysisId]);
      expect((await runEvents(t.ds, studyId)).sort()).toEqual(analyses.map((x) => x.id));
    }
  });

  it("an instance that lost its claim mid-run drops its result; the instance that took over stores one", async () => {
    const { studyId, runId } = await deadRun();
    const gate = firstArrivalGate();
    const remove = holdAt("analysis.before-store", gate.wait);
    try {
      const a = runner("instance-a");
      const slow = a.sweepOnce();
      await gate.reached; // A computed the result and is about to store it
      // A's lease lapses (as if its heartbeat stalled), and B takes the run up and finishes it.
      await t.ds
        .getRepository(AnalysisRun)
        .update({ id: runId }, { leaseUntil: new Date(Date.now() - 1000) });
      await runner("instance-b").sweepOnce();
      const byB = await runRow(t.ds, runId);
      expect(byB).toMatchObject({ status: "done", attempts: 3 });
      gate.release();
      await slow;
      expect(await runRow(t.ds, runId)).toEqual(byB);
      const analyses = await analysesOf(t.ds, studyId);
      expect(analyses.map((x) => x.id)).toEqual([analyses[0]!.id, byB.analysisId]);
      expect((await runEvents(t.ds, studyId)).sort()).toEqual(analyses.map((x) => x.id));
    } finally {
      remove();
    }
  });

  it("a request whose run was taken over waits and answers with the other instance's analysis", async () => {
    const { studyId, datasetId } = await analysedStudy(analyst);
    const gate = firstArrivalGate();
    const remove = holdAt("analysis.before-store", gate.wait);
    try {
      const pending = analyst
        .post(`/api/studies/${studyId}/analyses`)
        .send({ datasetId })
        .then((r) => r);
      await gate.reached;
      const run = await t.ds.getRepository(AnalysisRun).findOneByOrFail({ studyId, status: "running" });
      await t.ds
        .getRepository(AnalysisRun)
        .update({ id: run.id }, { leaseUntil: new Date(Date.now() - 1000) });
      await runner("instance-b").sweepOnce();
      gate.release();
      const res = await pending;
      expect(res.status).toBe(201);
      expect(res.body.analysis.id).toBe((await runRow(t.ds, run.id)).analysisId);
      expect(await analysesOf(t.ds, studyId)).toHaveLength(2);
    } finally {
      remove();
    }
  });

  it("a run under way keeps its claim: the heartbeat renews the lease, so no sweeper takes it", async () => {
    const { studyId, runId } = await deadRun();
    const gate = firstArrivalGate();
    const remove = holdAt("analysis.before-store", gate.wait);
    try {
      // A lease of 1 s renewed every 100 ms: without the heartbeat it would lapse during the wait.
      const a = new AnalysisRunner(
        t.ds,
        { ...SETTINGS, leaseMs: 1000, renewMs: 100 },
        runEngine,
        "instance-a",
      );
      const slow = a.sweepOnce();
      await gate.reached;
      const claimed = await runRow(t.ds, runId);
      await new Promise((r) => setTimeout(r, 1500));
      const renewed = await runRow(t.ds, runId);
      expect(renewed.claimedBy).toBe("instance-a");
      expect(renewed.leaseUntil!.getTime()).toBeGreaterThan(claimed.leaseUntil!.getTime());
      expect(renewed.leaseUntil!.getTime()).toBeGreaterThan(Date.now());
      await runner("instance-b").sweepOnce();
      expect((await runRow(t.ds, runId)).claimedBy).toBe("instance-a");
      gate.release();
      await slow;
      expect(await runRow(t.ds, runId)).toMatchObject({ status: "done", attempts: 2 });
      expect(await analysesOf(t.ds, studyId)).toHaveLength(2);
    } finally {
      remove();
    }
  });

  it("claims given back at shutdown are taken up by another instance; the giver's result is dropped", async () => {
    const { studyId, runId } = await deadRun();
    const gate = firstArrivalGate();
    const remove = holdAt("analysis.before-store", gate.wait);
    try {
      const a = runner("instance-a");
      const slow = a.sweepOnce();
      await gate.reached;
      a.stopSweeping();
      expect(await a.releaseClaims()).toBe(1);
      // Given back, not failed: queued again, and the attempt it gave back does not count.
      expect(await runRow(t.ds, runId)).toMatchObject({ status: "queued", claimedBy: null, attempts: 1 });
      gate.release();
      await slow;
      expect(await analysesOf(t.ds, studyId)).toHaveLength(1);
      await runner("instance-b").sweepOnce();
      expect(await runRow(t.ds, runId)).toMatchObject({ status: "done", attempts: 2 });
      expect(await analysesOf(t.ds, studyId)).toHaveLength(2);
    } finally {
      remove();
    }
  });
});

describe("a run leaves its whole result or nothing", () => {
  it("a run that fails in the worker every time leaves no analysis and fails after its attempts, with the reason", async () => {
    const { studyId, runId } = await deadRun({ attempts: 0 });
    await t.ds
      .getRepository(AnalysisRun)
      .update({ id: runId }, { status: "queued", claimedBy: null, leaseUntil: null });
    let calls = 0;
    const crashing: AnalysisEngine = () => {
      calls += 1;
      return Promise.reject(new Error("the worker exited with code 1"));
    };
    await runner("instance-f", t.ds, crashing).sweepOnce();
    expect(calls).toBe(3);
    const run = await runRow(t.ds, runId);
    expect(run).toMatchObject({
      status: "failed",
      attempts: 3,
      analysisId: null,
      claimedBy: null,
      errorStatus: 500,
      errorCode: "analysis_failed",
    });
    expect(run.errorMessage).toBe(
      "The analysis failed 3 times and was not run again; the last error: the worker exited with code 1",
    );
    expect(await analysesOf(t.ds, studyId)).toHaveLength(1);
    expect(await runEvents(t.ds, studyId)).toHaveLength(1);
    // A failed run is final: no sweeper takes it up again.
    await runner("instance-b").sweepOnce();
    expect((await runRow(t.ds, runId)).status).toBe("failed");
  });

  it("a run whose worker fails once is retried and stores one analysis", async () => {
    const { studyId, runId } = await deadRun();
    let calls = 0;
    const flaky: AnalysisEngine = (study, dataset) =>
      ++calls === 1 ? Promise.reject(new Error("worker lost")) : runEngine(study, dataset);
    await runner("instance-f", t.ds, flaky).sweepOnce();
    expect(calls).toBe(2);
    expect(await runRow(t.ds, runId)).toMatchObject({ status: "done", attempts: 3 });
    expect(await analysesOf(t.ds, studyId)).toHaveLength(2);
  });

  it("a run whose instance died on every attempt is not started again", async () => {
    const { studyId, runId } = await deadRun({ attempts: 3 });
    let calls = 0;
    const counting: AnalysisEngine = (s, d) => (calls++, runEngine(s, d));
    await runner("instance-b", t.ds, counting).sweepOnce();
    expect(calls).toBe(0);
    const run = await runRow(t.ds, runId);
    expect(run).toMatchObject({ status: "failed", attempts: 3, errorCode: "analysis_abandoned" });
    expect(run.errorMessage).toMatch(/^The analysis was started 3 times and each time its server stopped/);
    expect(await analysesOf(t.ds, studyId)).toHaveLength(1);
  });

  it("a request records its run: done with its analysis, or failed with the error it answered", async () => {
    const { studyId, datasetId } = await analysedStudy(analyst);
    const ok = await analyst.post(`/api/studies/${studyId}/analyses`).send({ datasetId }).expect(201);
    const refused = await analyst
      .post(`/api/studies/${studyId}/analyses`)
      .send({ datasetId, test: "kruskal-wallis", justification: "short" })
      .expect(400);
    const runs = await t.ds.getRepository(AnalysisRun).find({ where: { studyId }, order: { id: "ASC" } });
    expect(runs.map((r) => [r.status, r.analysisId, r.attempts, r.claimedBy])).toEqual([
      ["done", runs[0]!.analysisId, 1, null],
      ["done", ok.body.analysis.id, 1, null],
      ["failed", null, 1, null],
    ]);
    expect(runs[2]).toMatchObject({
      errorStatus: 400,
      errorCode: refused.body.error.code,
      errorMessage: refused.body.error.message,
    });
    // A request that fails its checks before the engine (no such dataset) records no run.
    await analyst.post(`/api/studies/${studyId}/analyses`).send({ datasetId: 99999 }).expect(404);
    expect(await t.ds.getRepository(AnalysisRun).countBy({ studyId })).toBe(3);
  });
});
