import request from "supertest";
import { beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../../test-support/agents.js";
import { makeTestApp } from "../../test-support/test-app.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let reviewer: Awaited<ReturnType<typeof signedIn>>;

const newStudy = {
  title: "Bench test of three adhesive cures",
  objective: "Compare lap-shear strength across cure schedules.",
  outcomeName: "Lap-shear strength",
  outcomeUnit: "MPa",
  factorName: "Cure schedule",
  levels: ["A", "B", "C"],
  controlLevel: "A",
  context: "general",
};

beforeAll(async () => {
  t = await makeTestApp();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
});

describe("studies", () => {
  it("asks signed-out callers to sign in (401) and refuses non-analysts creating (403)", async () => {
    await request(t.app).get("/api/studies").expect(401);
    const res = await reviewer.post("/api/studies").send(newStudy).expect(403);
    expect(res.body.error.code).toBe("forbidden");
  });

  it("creates a draft study with α = .05 and the default plan", async () => {
    const res = await analyst.post("/api/studies").send(newStudy).expect(201);
    expect(res.body.study).toMatchObject({
      status: "draft",
      alpha: 0.05,
      levels: ["A", "B", "C"],
      controlLevel: "A",
      designComplete: false,
    });
    expect(res.body.study.plan).toMatchObject({
      policy: "classic-first",
      adjust: "holm",
      lockedAt: null,
      plannedTest: "anova",
    });
  });

  it("validates the body and names the field", async () => {
    const res = await analyst
      .post("/api/studies")
      .send({ ...newStudy, levels: ["A"] })
      .expect(400);
    expect(res.body.error.message).toMatch(/^levels:/);
    const dup = await analyst
      .post("/api/studies")
      .send({ ...newStudy, levels: ["A", "A"] })
      .expect(400);
    expect(dup.body.error.message).toMatch(/different/);
    const ctl = await analyst
      .post("/api/studies")
      .send({ ...newStudy, controlLevel: "Z" })
      .expect(400);
    expect(ctl.body.error.message).toMatch(/^controlLevel:/);
  });

  it("saves design answers one at a time, stops a paired design, and locks the plan once complete", async () => {
    const { body } = await analyst.post("/api/studies").send(newStudy).expect(201);
    const id = body.study.id;
    await analyst.post(`/api/studies/${id}/plan/lock`).expect(422);
    const paired = await analyst
      .put(`/api/studies/${id}/design`)
      .send({ independence: "paired" })
      .expect(200);
    expect(paired.body.study.outOfScope).toMatch(/repeated-measures ANOVA/);
    const locked422 = await analyst.post(`/api/studies/${id}/plan/lock`).expect(422);
    expect(locked422.body.error.code).toBe("out_of_scope");
    for (const answer of [
      { independence: "independent" },
      { scale: "continuous" },
      { hasControl: "yes" },
      { comparisons: "all-pairs" },
      { assignment: "randomized" },
    ]) {
      await analyst.put(`/api/studies/${id}/design`).send(answer).expect(200);
    }
    const plan = await analyst
      .put(`/api/studies/${id}/plan`)
      .send({ policy: "welch-first", power: { effectF: 0.25, targetPower: 0.8 } })
      .expect(200);
    // k = 3, f = 0.25, α = .05, power .80: statsmodels 0.13.5 FTestAnovaPower.solve_power gives
    // nobs = 157.2 in all, i.e. 52.4 per group → 53 (checked in tests/reference/planning).
    expect(plan.body.study.plan).toMatchObject({
      policy: "welch-first",
      plannedTest: "welch",
      plannedPosthoc: "games-howell",
    });
    expect(plan.body.study.plan.power.nPerGroup).toBe(53);
    const lock = await analyst.post(`/api/studies/${id}/plan/lock`).expect(200);
    expect(Date.parse(lock.body.study.plan.lockedAt)).toBeGreaterThan(Date.now() - 60_000);
    await analyst.post(`/api/studies/${id}/plan/lock`).expect(409);
    await analyst.put(`/api/studies/${id}/design`).send({ scale: "ordinal" }).expect(409);
    await analyst.patch(`/api/studies/${id}`).send({ alpha: 0.01 }).expect(409);
    const title = await analyst.patch(`/api/studies/${id}`).send({ title: "Renamed bench test" }).expect(200);
    expect(title.body.study.title).toBe("Renamed bench test");
  });

  it("lets reviewers read but not edit, and hides other analysts' studies", async () => {
    const { body } = await analyst.post("/api/studies").send(newStudy).expect(201);
    await reviewer.get(`/api/studies/${body.study.id}`).expect(200);
    await reviewer.patch(`/api/studies/${body.study.id}`).send({ title: "x" }).expect(403);
    await analyst.get("/api/studies/99999").expect(404);
  });
});
