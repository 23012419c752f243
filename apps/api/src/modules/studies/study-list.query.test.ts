import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seedDemoStudies } from "../../db/seeds/demo-studies.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { User } from "../users/user.entity.js";
import { Study } from "./study.entity.js";
import { listStudies } from "./study-list.query.js";
import { createStudy, studyDto } from "./study.service.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;

beforeAll(async () => {
  t = await makeTestApp();
  // Three demo studies carried to a stored analysis, plus one with no data yet.
  await seedDemoStudies(t.ds);
  const analyst = await t.ds.getRepository(User).findOneByOrFail({ email: "analyst@waymark.test" });
  await createStudy(
    t.ds,
    { user: { ...analyst, active: true }, ip: null },
    {
      title: "A study without data",
      objective: "Invented.",
      outcomeName: "Yield",
      outcomeUnit: "g",
      factorName: "Line",
      levels: ["North", "South", "East"],
      controlLevel: null,
      context: "general",
    },
  );
});
afterAll(async () => t.services.stop());

// Property: the batched list says exactly what presenting each study on its own says.
describe("listStudies", () => {
  for (const email of ["analyst@waymark.test", "reviewer@waymark.test"]) {
    it(`equals each study's own view, in the same order, for ${email.split("@")[0]}`, async () => {
      const user = await t.ds.getRepository(User).findOneByOrFail({ email });
      const studies = await t.ds.getRepository(Study).find({
        where: user.role === "analyst" ? { ownerId: user.id } : {},
        order: { updatedAt: "DESC" },
      });
      const one = await Promise.all(studies.map((s) => studyDto(t.ds, s)));
      const listed = await listStudies(t.ds, user);
      expect(one.length).toBe(4);
      expect(one.filter((s) => s.latestDataset && s.latestAnalysisId).length).toBe(3);
      expect(listed).toEqual(one);
    });
  }
});
