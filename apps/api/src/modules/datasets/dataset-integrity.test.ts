import { beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../../test-support/agents.js";
import { analysedStudy, YIELD_CSV } from "../../test-support/analysed-study.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { tamper } from "../../test-support/tamper.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
});

/** Datasets are immutable, so simulate damage by lifting the guard for one statement. */
async function tamperContent(datasetId: number, content: Buffer): Promise<void> {
  await tamper(
    t.ds,
    "datasets",
    "trg_datasets_no_update",
    `UPDATE datasets SET content = :content WHERE id = :id`,
    {
      content,
      id: datasetId,
    },
  );
}

describe("stored datasets are verified against their SHA-256 before use", () => {
  it("refuses to analyse a dataset whose stored bytes changed, naming the version, and stores nothing", async () => {
    const { studyId, datasetId } = await analysedStudy(analyst);
    // One digit changed, same length: still a valid CSV, so only the hash can tell.
    const altered = Buffer.from(YIELD_CSV.replace("10.1", "10.2"));
    expect(altered.length).toBe(Buffer.byteLength(YIELD_CSV));
    await tamperContent(datasetId, altered);

    const res = await analyst.post(`/api/studies/${studyId}/analyses`).send({ datasetId }).expect(500);
    expect(res.body.error.code).toBe("dataset_corrupt");
    expect(res.body.error.message).toMatch(/Dataset version 1 no longer matches its recorded SHA-256/);
    const checks = await analyst.get(`/api/studies/${studyId}/datasets/${datasetId}/checks`).expect(500);
    expect(checks.body.error.code).toBe("dataset_corrupt");

    const list = await analyst.get(`/api/studies/${studyId}/analyses`).expect(200);
    expect(list.body.analyses).toHaveLength(1);
  });

  it("still analyses a dataset whose bytes are as uploaded", async () => {
    const { studyId, datasetId } = await analysedStudy(analyst);
    await analyst.post(`/api/studies/${studyId}/analyses`).send({ datasetId }).expect(201);
  });
});
