import { beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../../test-support/agents.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { DEMO_DRAFT, DEMO_STAGES, seedDemoStudies } from "./demo-studies.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let who: Record<"analyst" | "reviewer" | "writer" | "admin", Awaited<ReturnType<typeof signedIn>>>;

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoStudies(t.ds, t.env.demoPassword);
  await seedDemoStudies(t.ds, t.env.demoPassword); // runs once
  who = {
    analyst: await signedIn(t.app, "analyst", t.env.demoPassword),
    reviewer: await signedIn(t.app, "reviewer", t.env.demoPassword),
    writer: await signedIn(t.app, "writer", t.env.demoPassword),
    admin: await signedIn(t.app, "admin", t.env.demoPassword),
  };
}, 120_000);

type Listed = { id: number; title: string; progress: { state: string; nextStep: { who: string } } };

describe("demo data on first sign-in", () => {
  it("shows the whole life cycle: a draft, one awaiting review, one sent back, one approved", async () => {
    const list: Listed[] = (await who.analyst.get("/api/studies").expect(200)).body.studies;
    expect(list).toHaveLength(4);
    const state = Object.fromEntries(list.map((s) => [s.title, s.progress.state]));
    expect(state).toEqual({
      [DEMO_DRAFT.title]: "plan-open",
      ...Object.fromEntries(Object.entries(DEMO_STAGES)),
    });
  });

  it("gives every role something to do", async () => {
    const list: Listed[] = (await who.analyst.get("/api/studies").expect(200)).body.studies;
    expect(list.filter((s) => s.progress.nextStep.who === "analyst")).toHaveLength(2);
    const queue = (await who.reviewer.get("/api/reviews/queue").expect(200)).body.queue;
    expect(queue.map((q: { title: string }) => q.title)).toEqual([
      "Call handling time under three routing rules",
    ]);
    expect((await who.admin.get("/api/reviews/queue").expect(200)).body.queue).toHaveLength(1);
    const approved = list.find((s) => s.progress.state === "approved")!;
    expect(approved.progress.nextStep.who).toBe("writer");
    await who.writer.get(`/api/studies/${approved.id}/report.docx`).expect(200);
  });

  it("the study sent back carries the reviewer's comments at the steps they concern", async () => {
    const list: Listed[] = (await who.analyst.get("/api/studies").expect(200)).body.studies;
    const back = list.find((s) => s.progress.state === "changes-requested")!;
    const history = (await who.analyst.get(`/api/studies/${back.id}/history`).expect(200)).body;
    expect(history.rounds).toHaveLength(1);
    expect(history.rounds[0].decision).toBe("changes_requested");
    expect(history.rounds[0].comments.map((c: { step: string | null }) => c.step)).toEqual([
      null,
      "data",
      "results",
    ]);
    expect(history.progress.detail).toMatch(/^The reviewer sent round 1 back with 3 comments\./);
    // The study itself carries them, so each shows at its step.
    const study = (await who.analyst.get(`/api/studies/${back.id}`).expect(200)).body.study;
    expect(study.openReview.comments.map((c: { step: string | null }) => c.step)).toEqual([
      null,
      "data",
      "results",
    ]);
    expect(study.progress.label).toBe("Changes requested");
  });
});
