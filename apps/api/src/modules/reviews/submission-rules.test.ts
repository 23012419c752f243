import { beforeAll, describe, expect, it } from "vitest";
import { holdAt } from "../../db/pause-points.js";
import { signedIn } from "../../test-support/agents.js";
import { YIELD_CSV, analysedStudy } from "../../test-support/analysed-study.js";
import { makeTestApp } from "../../test-support/test-app.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let reviewer: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
});

const upload = (studyId: number, csv = YIELD_CSV) =>
  analyst
    .post(`/api/studies/${studyId}/datasets`)
    .field("groupColumn", "Line")
    .field("outcomeColumn", "Yield (g)")
    .attach("file", Buffer.from(csv), "yield.csv");

/** A gate a held write waits at, and a promise that resolves when the write reaches it. */
function gate() {
  let release!: () => void;
  let arrived!: () => void;
  const opened = new Promise<void>((r) => (release = r));
  const reached = new Promise<void>((r) => (arrived = r));
  return { wait: () => (arrived(), opened), release, reached };
}

describe("a submission names one analysis of the active data version", () => {
  it("refuses a stale analysis after a new version with 409 saying what to do, then takes the new one", async () => {
    const { studyId, analysisId } = await analysedStudy(analyst);
    const v2 = (await upload(studyId, YIELD_CSV.replace("North,10.1\n", "")).expect(201)).body.dataset;
    const stale = await analyst.post(`/api/studies/${studyId}/submit`).send({ analysisId }).expect(409);
    expect(stale.body.error.code).toBe("analysis_not_on_active_version");
    expect(stale.body.error.message).toBe(
      `Analysis ${analysisId} used data version 1, but the active version is 2. Run the analysis on version 2 and submit that, or make version 1 active again first.`,
    );
    const none = await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(409);
    expect(none.body.error.code).toBe("active_version_not_analysed");
    const study = (await analyst.get(`/api/studies/${studyId}`).expect(200)).body.study;
    expect(study.progress).toMatchObject({ state: "awaiting-analysis", nextStep: { who: "analyst" } });
    expect(study.activeDataset.version).toBe(2);

    const run = await analyst.post(`/api/studies/${studyId}/analyses`).send({ datasetId: v2.id }).expect(201);
    const sub = await analyst
      .post(`/api/studies/${studyId}/submit`)
      .send({ analysisId: run.body.analysis.id })
      .expect(200);
    expect(sub.body.study.progress).toMatchObject({ state: "in-review", label: "Awaiting review" });
    const history = (await reviewer.get(`/api/studies/${studyId}/history`).expect(200)).body;
    expect(history.rounds[0]).toMatchObject({ analysisId: run.body.analysis.id, datasetId: v2.id });
    expect(history.progress.state).toBe("in-review");
    const queue = (await reviewer.get("/api/reviews/queue").expect(200)).body.queue;
    expect(queue.find((q: { studyId: number }) => q.studyId === studyId).progress.state).toBe("in-review");
  });
});

describe("nothing lands after submit (race tests; the slow write is held at a pause point)", () => {
  it("an upload that started before submit and finishes after it is refused; the study keeps one version", async () => {
    const { studyId } = await analysedStudy(analyst);
    const g = gate();
    const remove = holdAt("dataset.before-store", g.wait);
    try {
      const slow = upload(studyId).then((r) => r);
      await g.reached; // parsed, about to write
      await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
      g.release();
      const res = await slow;
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/in review; it can change only as a draft/);
    } finally {
      remove();
    }
    const versions = (await analyst.get(`/api/studies/${studyId}/datasets`).expect(200)).body.datasets;
    expect(versions).toHaveLength(1);
  });

  it("an analysis run that started before submit and finishes after it is refused; no analysis is added", async () => {
    const { studyId, datasetId } = await analysedStudy(analyst);
    const g = gate();
    const remove = holdAt("analysis.before-store", g.wait);
    try {
      const slow = analyst
        .post(`/api/studies/${studyId}/analyses`)
        .send({ datasetId })
        .then((r) => r);
      await g.reached; // engine done, about to write
      await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
      g.release();
      expect((await slow).status).toBe(409);
    } finally {
      remove();
    }
    const analyses = (await analyst.get(`/api/studies/${studyId}/analyses`).expect(200)).body.analyses;
    expect(analyses).toHaveLength(1);
  });

  it("in review and after approval, runs and uploads are refused (state checked in the write)", async () => {
    const { studyId, datasetId } = await analysedStudy(analyst);
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    // In review: the run is refused before it starts.
    await analyst.post(`/api/studies/${studyId}/analyses`).send({ datasetId }).expect(409);
    await reviewer
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: t.env.demoPassword, meaning: "Approved as the analysis of record" })
      .expect(200);
    await upload(studyId).expect(409);
    const s = (await analyst.get(`/api/studies/${studyId}`).expect(200)).body.study;
    expect(s.progress).toMatchObject({ state: "approved", nextStep: { who: "writer" } });
  });
});
