import { beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../../test-support/agents.js";
import { YIELD_CSV, analysedStudy } from "../../test-support/analysed-study.js";
import { lockedStudy } from "../../test-support/locked-study.js";
import { makeTestApp } from "../../test-support/test-app.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let reviewer: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
});

const upload = (studyId: number, csv: string, levelMap?: object) => {
  const req = analyst
    .post(`/api/studies/${studyId}/datasets`)
    .field("groupColumn", "Line")
    .field("outcomeColumn", "Yield (g)");
  if (levelMap) req.field("levelMap", JSON.stringify(levelMap));
  return req.attach("file", Buffer.from(csv), "yield.csv");
};

describe("uploads must match the plan", () => {
  it("refuses a file without a planned group (422 listing it), and stores nothing", async () => {
    const id = await lockedStudy(analyst);
    const twoOfThree = YIELD_CSV.split("\n")
      .filter((l) => !l.startsWith("East"))
      .join("\n");
    const res = await upload(id, twoOfThree).expect(422);
    expect(res.body.error.code).toBe("data_does_not_match_plan");
    expect(res.body.error.message).toBe(
      'The data do not match the plan. No data for the planned level "East".',
    );
    expect(res.body.error.details.missing).toEqual(["East"]);
    expect((await analyst.get(`/api/studies/${id}/datasets`).expect(200)).body.datasets).toHaveLength(0);
  });

  it("offers a near-miss name for mapping, then stores the file once the mapping is confirmed", async () => {
    const id = await lockedStudy(analyst);
    const lower = YIELD_CSV.replace(/^East,/gm, "east ,");
    const res = await upload(id, lower).expect(422);
    expect(res.body.error.details.suggestions).toEqual([{ found: "east", planned: "East" }]);
    expect(res.body.error.details.report.levelSuggestions).toEqual([{ found: "east", planned: "East" }]);
    const ok = await upload(id, lower, { east: "East" }).expect(201);
    expect(ok.body.dataset.report.groupsFound.map((g: { name: string }) => g.name)).toEqual([
      "North",
      "South",
      "East",
    ]);
    await upload(id, lower, { east: "West" }).expect(400);
  });

  it("refuses a group the plan does not name instead of dropping it", async () => {
    const id = await lockedStudy(analyst);
    const res = await upload(id, `${YIELD_CSV}\nWest,9.9\nWest,10.2`).expect(422);
    expect(res.body.error.details.unplanned).toEqual(["West"]);
    expect(res.body.error.message).toMatch(/does not name: "West"; map it to a planned level or to null/);
    const kept = await upload(id, `${YIELD_CSV}\nWest,9.9\nWest,10.2`, { West: null }).expect(201);
    expect(kept.body.dataset.report.messages).toContain(
      'Left out "West" at the analyst\'s request: the plan does not name it.',
    );
  });
});

describe("any version can be made active again", () => {
  it("activates version 1 after version 2, audited; submission then takes version 1's analysis", async () => {
    const { studyId, datasetId: v1, analysisId } = await analysedStudy(analyst);
    const v2 = (await upload(studyId, YIELD_CSV.replace("North,10.1\n", "")).expect(201)).body.dataset;
    let s = (await analyst.get(`/api/studies/${studyId}`).expect(200)).body.study;
    expect(s.activeDataset.id).toBe(v2.id);
    await reviewer.post(`/api/studies/${studyId}/datasets/${v1}/activate`).expect(403);
    await analyst.post(`/api/studies/${studyId}/datasets/999999/activate`).expect(404);
    await analyst.post(`/api/studies/${studyId}/datasets/${v1}/activate`).expect(200);
    s = (await analyst.get(`/api/studies/${studyId}`).expect(200)).body.study;
    expect(s.activeDataset.id).toBe(v1);
    const listed = (await analyst.get(`/api/studies/${studyId}/datasets`).expect(200)).body.datasets;
    expect(listed.map((d: { version: number; active: boolean }) => [d.version, d.active])).toEqual([
      [2, false],
      [1, true],
    ]);
    expect(s.progress.state).toBe("ready-to-submit");
    const sub = await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    expect(sub.body.study.progress.detail).toBe(
      `Round 1 was submitted with analysis ${analysisId} on data version 1.`,
    );
    await analyst.post(`/api/studies/${studyId}/datasets/${v2.id}/activate`).expect(409); // in review
    const events = (await reviewer.get(`/api/studies/${studyId}/history`).expect(200)).body.events;
    expect(events.map((e: { action: string }) => e.action)).toContain("dataset.activated");
    expect(events.find((e: { action: string }) => e.action === "dataset.activated").summary).toBe(
      "Made data version 1 active (was version 2)",
    );
  });
});
