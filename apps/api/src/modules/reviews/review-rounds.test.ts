import { beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../../test-support/agents.js";
import { YIELD_CSV, analysedStudy } from "../../test-support/analysed-study.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { roundChanges, type RoundRecord } from "./round-changes.js";
import { OutboxMessage } from "../mail/outbox-message.entity.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let reviewer: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
});

describe("review rounds people can work in", () => {
  it("comments at steps, the analyst's reply to each, and from round 2 what changed", async () => {
    const { studyId } = await analysedStudy(analyst);
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    await reviewer
      .post(`/api/studies/${studyId}/request-changes`)
      .send({
        comment: "See the data step.",
        stepComments: [{ step: "data", body: "North's first value looks mistyped." }],
      })
      .expect(200);
    let history = (await analyst.get(`/api/studies/${studyId}/history`).expect(200)).body;
    const dataComment = history.rounds[0].comments.find((c: { step: string }) => c.step === "data");
    await reviewer
      .post(`/api/studies/${studyId}/comments/${dataComment.id}/replies`)
      .send({ body: "not mine to answer" })
      .expect(403);
    await analyst
      .post(`/api/studies/${studyId}/comments/${dataComment.id}/replies`)
      .send({ body: "" })
      .expect(400);
    await analyst
      .post(`/api/studies/${studyId}/comments/${dataComment.id}/replies`)
      .send({ body: "It was mistyped; version 2 drops that row." })
      .expect(201);
    const open = (await analyst.get(`/api/studies/${studyId}`).expect(200)).body.study.openReview;
    expect(open.round).toBe(1);
    expect(open.comments.find((c: { step: string }) => c.step === "data").replies).toHaveLength(1);

    const v2 = await analyst
      .post(`/api/studies/${studyId}/datasets`)
      .field("groupColumn", "Line")
      .field("outcomeColumn", "Yield (g)")
      .attach("file", Buffer.from(YIELD_CSV.replace("North,10.1\n", "")), "yield-v2.csv")
      .expect(201);
    await analyst
      .post(`/api/studies/${studyId}/analyses`)
      .send({ datasetId: v2.body.dataset.id })
      .expect(201);
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    // Round 1 is closed: no more replies to it.
    await analyst
      .post(`/api/studies/${studyId}/comments/${dataComment.id}/replies`)
      .send({ body: "late" })
      .expect(409);

    history = (await reviewer.get(`/api/studies/${studyId}/history`).expect(200)).body;
    expect(history.rounds[0].changes).toBeNull();
    const replies = history.rounds[0].comments.find((c: { step: string }) => c.step === "data").replies;
    expect(replies.map((r: { body: string }) => r.body)).toEqual([
      "It was mistyped; version 2 drops that row.",
    ]);
    const changes = history.rounds[1].changes;
    expect(changes.dataVersion).toEqual({ before: 1, after: 2, changed: true });
    expect(changes.summary[0]).toBe("Data version 1 → 2.");
    expect(changes.keyNumbers.find((k: { name: string }) => k.name === "values analysed")).toEqual({
      name: "values analysed",
      before: "15",
      after: "14",
    });
    expect(history.events.map((e: { action: string }) => e.action)).toContain("study.comment-answered");
    // The reviewers' e-mail for round 2 says what changed, and carries the one status.
    const mail = await t.ds
      .getRepository(OutboxMessage)
      .find({ where: { to: "reviewer@waymark.test" }, order: { id: "DESC" }, take: 1 });
    expect(mail[0]!.text).toContain("What changed since the last round: Data version 1 → 2.");
    expect(mail[0]!.text).toContain("Status: Awaiting review. Round 2 was submitted with analysis");
  });
});

describe("what changed between rounds (pure)", () => {
  const r = (over: Partial<RoundRecord>): RoundRecord => ({
    round: 1,
    analysisId: 1,
    datasetVersion: 1,
    chosenTest: "welch",
    posthocMethod: "Games–Howell",
    deviation: null,
    result: { welch: { F: 4.2, p: 0.03 }, anova: { etaSquared: 0.31 }, groups: [{ n: 5 }, { n: 5 }] },
    ...over,
  });
  it("says nothing changed when nothing did", () => {
    expect(roundChanges(r({}), r({ round: 2, analysisId: 2 })).summary).toEqual([
      "Nothing in the analysis changed since round 1.",
    ]);
  });
  it("names a test change, a new deviation and the moved numbers", () => {
    const c = roundChanges(
      r({}),
      r({
        round: 2,
        chosenTest: "kruskal-wallis",
        posthocMethod: "Dunn",
        deviation: "Two bolted plants stay in; ranks keep them from dominating.",
        result: { kruskalWallis: { H: 6.1, p: 0.047, epsilonSquared: 0.2 }, groups: [{ n: 5 }, { n: 5 }] },
      }),
    );
    expect(c.test.changed).toBe(true);
    expect(c.summary).toContain(
      "New deviation: “Two bolted plants stay in; ranks keep them from dominating.”",
    );
    expect(c.keyNumbers.find((k) => k.name === "H")).toEqual({ name: "H", before: null, after: "6.10" });
    expect(c.summary.join(" ")).not.toMatch(/undefined|NaN/);
  });
});
