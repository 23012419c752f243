import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seedDemoStudies } from "../../db/seeds/demo-studies.js";
import { YIELD_CSV } from "../../test-support/analysed-study.js";
import { signedIn } from "../../test-support/agents.js";
import { lockedStudy } from "../../test-support/locked-study.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { Study } from "./study.entity.js";
import { studyDto, studyDtos } from "./study.service.js";
import { findStudies, type StudyFilter } from "./study-list-records.js";

// The list reads many studies' records in a few queries; the study page and every write read
// one study's records query by query. Both must give the same DTO, field by field, so the one
// status function and the presenter see the same records either way. Property: equality of the
// two paths over studies at every stage (common practice: an optimized path checked against the
// straightforward one).

let t: Awaited<ReturnType<typeof makeTestApp>>;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let analyst: Agent;
let reviewer: Agent;
const stages = new Map<string, number>();

const SECOND_CSV = YIELD_CSV.replace("North,10.1", "North,10.4").replace("East,10.4", "East,10.8");

async function upload(studyId: number, csv = YIELD_CSV): Promise<number> {
  const res = await analyst
    .post(`/api/studies/${studyId}/datasets`)
    .field("groupColumn", "Line")
    .field("outcomeColumn", "Yield (g)")
    .attach("file", Buffer.from(csv), "yield.csv")
    .expect(201);
  return res.body.dataset.id as number;
}
const run = async (studyId: number, datasetId: number, extra: Record<string, unknown> = {}) =>
  (
    await analyst
      .post(`/api/studies/${studyId}/analyses`)
      .send({ datasetId, ...extra })
      .expect(201)
  ).body.analysis.id as number;
const submit = (studyId: number) => analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
const sendBack = (studyId: number) =>
  reviewer
    .post(`/api/studies/${studyId}/request-changes`)
    .send({
      comment: "Say how the outlying plots were handled.",
      stepComments: [
        { step: "data", body: "Name the rows you removed." },
        { step: "results", body: "Give the intervals as well as p." },
      ],
    })
    .expect(200);

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoStudies(t.ds, t.env.demoPassword);
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);

  const draft = await analyst
    .post("/api/studies")
    .send({
      title: "Nothing answered yet",
      objective: "Fixture.",
      outcomeName: "Yield",
      outcomeUnit: "g",
      factorName: "Line",
      levels: ["North", "South", "East"],
      controlLevel: null,
      context: "general",
    })
    .expect(201);
  stages.set("draft", draft.body.study.id);
  await analyst
    .put(`/api/studies/${draft.body.study.id}/design`)
    .send({ independence: "paired" })
    .expect(200);

  stages.set("plan locked", await lockedStudy(analyst));

  const uploaded = await lockedStudy(analyst);
  await upload(uploaded);
  stages.set("data uploaded", uploaded);

  const analysed = await lockedStudy(analyst);
  await run(analysed, await upload(analysed));
  stages.set("analysed", analysed);

  // v1 analysed, v2 uploaded and not yet analysed; another with v1 made active again.
  const versions = await lockedStudy(analyst);
  const v1 = await run(versions, await upload(versions));
  await upload(versions, SECOND_CSV);
  stages.set("several versions, newest not analysed", versions);
  expect(v1).toBeGreaterThan(0);
  const reactivated = await lockedStudy(analyst);
  const first = await upload(reactivated);
  await run(reactivated, first);
  const second = await upload(reactivated, SECOND_CSV);
  await run(reactivated, second);
  await analyst.post(`/api/studies/${reactivated}/datasets/${first}/activate`).send({}).expect(200);
  stages.set("older version active again", reactivated);

  // A deviation: another test than the plan's, with its justification.
  const deviation = await lockedStudy(analyst);
  await run(deviation, await upload(deviation), {
    test: "kruskal-wallis",
    justification: "The data hold two far outliers that the planned test would weigh heavily.",
  });
  stages.set("deviation", deviation);

  const submitted = await lockedStudy(analyst);
  await run(submitted, await upload(submitted));
  await submit(submitted);
  stages.set("submitted", submitted);

  // Sent back with step comments, one of them answered.
  const sentBack = await lockedStudy(analyst);
  await run(sentBack, await upload(sentBack));
  await submit(sentBack);
  const round = await sendBack(sentBack);
  const comments = round.body.study?.openReview?.comments ?? (await studyOf(sentBack)).openReview!.comments;
  await analyst
    .post(`/api/studies/${sentBack}/comments/${comments[1].id}/replies`)
    .send({ body: "Rows 4 and 9; both were mislabelled plots." })
    .expect(201);
  stages.set("changes requested", sentBack);

  // Sent back, then new data uploaded (the round's analysis is on an older version).
  const reworked = await lockedStudy(analyst);
  await run(reworked, await upload(reworked));
  await submit(reworked);
  await sendBack(reworked);
  await upload(reworked, SECOND_CSV);
  stages.set("changes requested, new data", reworked);

  // Two rounds: sent back once, resubmitted, approved.
  const approved = await lockedStudy(analyst);
  await run(approved, await upload(approved));
  await submit(approved);
  await sendBack(approved);
  await submit(approved);
  await reviewer
    .post(`/api/studies/${approved}/approve`)
    .send({ password: t.env.demoPassword, meaning: "Approved as the analysis of record" })
    .expect(200);
  stages.set("approved in round 2", approved);
}, 120_000);
afterAll(async () => t.services.stop());

async function studyOf(id: number) {
  return studyDto(t.ds, await t.ds.getRepository(Study).findOneByOrFail({ id }));
}

describe("the studies list's batched records", () => {
  it("give every study the same DTO as reading it alone, field by field", async () => {
    const all = await t.ds.getRepository(Study).find({ order: { id: "ASC" } });
    expect(all.length).toBe(4 + stages.size); // the four demo studies and the stages above
    const batched = await studyDtos(t.ds, all);
    const single = await Promise.all(all.map((s) => studyDto(t.ds, s)));
    for (let i = 0; i < all.length; i++) {
      for (const key of Object.keys(single[i]!) as (keyof (typeof single)[number])[])
        expect({ study: all[i]!.title, key, value: batched[i]![key] }).toEqual({
          study: all[i]!.title,
          key,
          value: single[i]![key],
        });
      expect(Object.keys(batched[i]!).sort()).toEqual(Object.keys(single[i]!).sort());
    }
    // One study alone through the batched path answers the same too.
    for (const s of all) expect(await studyDtos(t.ds, [s])).toEqual([await studyDto(t.ds, s)]);
  });

  it("covers every stage a study can be at, with the records behind each", async () => {
    const byStage = async (name: string) => (await studyOf(stages.get(name)!)).progress.state;
    expect(await byStage("draft")).toBe("out-of-scope");
    expect(await byStage("plan locked")).toBe("awaiting-data");
    expect(await byStage("data uploaded")).toBe("awaiting-analysis");
    expect(await byStage("analysed")).toBe("ready-to-submit");
    expect(await byStage("several versions, newest not analysed")).toBe("awaiting-analysis");
    expect(await byStage("older version active again")).toBe("ready-to-submit");
    expect(await byStage("deviation")).toBe("ready-to-submit");
    expect(await byStage("submitted")).toBe("in-review");
    expect(await byStage("changes requested")).toBe("changes-requested");
    expect(await byStage("changes requested, new data")).toBe("changes-requested");
    expect(await byStage("approved in round 2")).toBe("approved");
    const sentBack = await studyOf(stages.get("changes requested")!);
    expect(sentBack.openReview!.comments.map((c) => c.replies.length)).toEqual([0, 1, 0]);
    const reactivated = await studyOf(stages.get("older version active again")!);
    expect([
      reactivated.datasetCount,
      reactivated.activeDataset!.version,
      reactivated.latestDataset!.version,
    ]).toEqual([2, 1, 2]);
    // The demo seeds' stages are among them.
    const all = await t.ds.getRepository(Study).find();
    const states = new Set((await studyDtos(t.ds, all)).map((s) => s.progress.state));
    for (const s of ["approved", "in-review", "changes-requested", "plan-open"]) expect(states).toContain(s);
  });

  it("reads each role's list as the eager find does: the same studies, order, owners and lockers", async () => {
    const analystId = (await t.ds.getRepository(Study).findOneByOrFail({ id: stages.get("draft")! })).ownerId;
    const filters: StudyFilter[] = [{ ownerId: analystId }, { status: "approved" }, {}];
    for (const filter of filters) {
      const lean = await findStudies(t.ds, filter);
      const eager = await t.ds
        .getRepository(Study)
        .find({ where: filter, order: { updatedAt: "DESC", id: "DESC" } });
      expect(lean.map((s) => s.id).sort()).toEqual(eager.map((s) => s.id).sort());
      const byId = new Map(eager.map((s) => [s.id, s]));
      for (const s of lean) expect(s).toEqual(byId.get(s.id));
      expect(lean.length).toBeGreaterThan(0);
    }
  });

  it("serves the list through the batched path: the same studies as reading each", async () => {
    const list = (await analyst.get("/api/studies").expect(200)).body.studies as { id: number }[];
    for (const s of list.slice(0, 5)) {
      const one = (await analyst.get(`/api/studies/${s.id}`).expect(200)).body.study;
      expect(s).toEqual(one);
    }
  });
});
