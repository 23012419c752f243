import { beforeAll, describe, expect, it } from "vitest";
import { anon, signedIn } from "../../test-support/agents.js";
import { analysedStudy } from "../../test-support/analysed-study.js";
import { lockedStudy } from "../../test-support/locked-study.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { sql } from "../../test-support/sql.js";
import { tamper } from "../../test-support/tamper.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let reviewer: Awaited<ReturnType<typeof signedIn>>;
let writer: Awaited<ReturnType<typeof signedIn>>;
let admin: Awaited<ReturnType<typeof signedIn>>;
const MEANING = "Approved as the analysis of record";

beforeAll(async () => {
  t = await makeTestApp();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
  writer = await signedIn(t.app, "writer", t.env.demoPassword);
  admin = await signedIn(t.app, "admin", t.env.demoPassword);
});

describe("review state machine", () => {
  it("refuses to submit without an analysis (409), and refuses non-analysts (403)", async () => {
    const id = await lockedStudy(analyst);
    const res = await analyst.post(`/api/studies/${id}/submit`).send({}).expect(409);
    expect(res.body.error.message).toMatch(/Run the analysis/);
    await reviewer.post(`/api/studies/${id}/submit`).send({}).expect(403);
  });

  it("draft → in review → changes requested → draft → in review → approved, keeping every round", async () => {
    const { studyId } = await analysedStudy(analyst);
    await reviewer
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: t.env.demoPassword, meaning: MEANING })
      .expect(409); // approving a draft
    const sub = await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    expect(sub.body.study.status).toBe("in_review");
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(409); // submitting twice
    await analyst.patch(`/api/studies/${studyId}`).send({ title: "edited while in review" }).expect(409); // frozen

    const queue = await reviewer.get("/api/reviews/queue").expect(200);
    expect(queue.body.queue.find((q: { studyId: number }) => q.studyId === studyId)).toMatchObject({
      round: 1,
      override: false,
      daysWaiting: 0,
    });
    await writer.get("/api/reviews/queue").expect(403);

    await reviewer.post(`/api/studies/${studyId}/request-changes`).send({ comment: "" }).expect(400);
    const back = await reviewer
      .post(`/api/studies/${studyId}/request-changes`)
      .send({
        comment: "Add the October batch before deciding.",
        stepComments: [{ step: "data", body: "Batch 7 is missing." }],
      })
      .expect(200);
    expect(back.body.study.status).toBe("draft");
    await reviewer.post(`/api/studies/${studyId}/request-changes`).send({ comment: "again" }).expect(409);

    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    const bad = await reviewer
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: "wrong", meaning: MEANING })
      .expect(403);
    expect(bad.body.error.code).toBe("signature_rejected");
    const ok = await reviewer
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: t.env.demoPassword, meaning: MEANING })
      .expect(200);
    expect(ok.body.study.status).toBe("approved");
    await reviewer
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: t.env.demoPassword, meaning: MEANING })
      .expect(409);

    const h = await writer.get(`/api/studies/${studyId}/history`).expect(200);
    expect(h.body.rounds.map((r: { round: number; decision: string }) => [r.round, r.decision])).toEqual([
      [1, "changes_requested"],
      [2, "approved"],
    ]);
    expect(h.body.rounds[0].comments.map((c: { step: string | null }) => c.step)).toEqual([null, "data"]);
    expect(h.body.rounds[1].signature).toMatchObject({
      signerName: "Rui Takahashi",
      meaning: MEANING,
      contentHash: expect.stringMatching(/^[0-9a-f]{64}$/),
    });
    expect(h.body.approvalValid).toBe(true);
    expect(h.body.events.map((e: { action: string }) => e.action)).toEqual(
      expect.arrayContaining([
        "study.created",
        "study.plan-locked",
        "dataset.uploaded",
        "analysis.run",
        "study.submitted",
        "study.changes-requested",
        "study.approved",
      ]),
    );
  });

  it("voids an approval when what it covered changes", async () => {
    const { studyId, analysisId } = await analysedStudy(analyst);
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    await reviewer
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: t.env.demoPassword, meaning: MEANING })
      .expect(200);
    // Analyses are immutable, so simulate tampering by dropping the guard for one statement.
    await tamper(
      t.ds,
      "analyses",
      "trg_analyses_no_update",
      `UPDATE analyses SET chosen_test = 'welch' WHERE id = :id`,
      {
        id: analysisId,
      },
    );
    const h = await reviewer.get(`/api/studies/${studyId}/history`).expect(200);
    expect(h.body.approvalValid).toBe(false);
    expect(h.body.approvalNote).toMatch(/changed since it was signed/);
  });
});

describe("separation of duties", () => {
  it("an admin cannot approve a study they created, with a message that says why", async () => {
    // The admin signs in as themselves; the study below belongs to the analyst, so the admin may approve it...
    const { studyId } = await analysedStudy(analyst);
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    // ...but nobody can approve their own: make the admin the owner for this check.
    const adminId = (await admin.get("/api/auth/me")).body.user.id;
    await sql(t.ds, `UPDATE studies SET owner_id = :adminId WHERE id = :studyId`, { adminId, studyId });
    const res = await admin
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: t.env.demoPassword, meaning: MEANING })
      .expect(403);
    expect(res.body.error.message).toMatch(/separation of duties/);
  });

  it("is 401 signed out and 403 for writers", async () => {
    const { studyId } = await analysedStudy(analyst);
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    await (
      await anon(t.app)
    )
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: "x", meaning: MEANING })
      .expect(401);
    await writer
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: t.env.demoPassword, meaning: MEANING })
      .expect(403);
  });
});
