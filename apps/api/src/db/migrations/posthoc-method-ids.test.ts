import { beforeAll, describe, expect, it } from "vitest";
import { signedIn } from "../../test-support/agents.js";
import { analysedStudy } from "../../test-support/analysed-study.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { sql } from "../../test-support/sql.js";
import { verifyApproval } from "../../modules/reviews/review.service.js";
import { PosthocMethodIds1764806400000 } from "./1764806400000-posthoc-method-ids.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;

beforeAll(async () => {
  t = await makeTestApp();
});

const stored = async (id: number) =>
  (await sql<{ m: string }>(t.ds, `SELECT "posthoc_method" AS m FROM "analyses" WHERE "id" = :id`, { id }))[0]
    ?.m;

describe("migration 1764806400000: post-hoc families stored as ids", () => {
  it("converts display text to ids and back, keeps rows immutable, and leaves signatures valid", async () => {
    const analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
    const reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
    const { studyId, analysisId } = await analysedStudy(analyst);
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    await reviewer
      .post(`/api/studies/${studyId}/approve`)
      .send({ password: t.env.demoPassword, meaning: "Approved as the analysis of record" })
      .expect(200);
    expect(await stored(analysisId)).toBe("tukey-kramer");

    const migration = new PosthocMethodIds1764806400000();
    const q = t.ds.createQueryRunner();
    try {
      await migration.down(q); // back to the wording rows held before ids
      expect(await stored(analysisId)).toBe("Tukey–Kramer HSD");
      expect((await verifyApproval(t.ds, studyId)).valid).toBe(true);
      await migration.up(q);
      expect(await stored(analysisId)).toBe("tukey-kramer");
      expect((await verifyApproval(t.ds, studyId)).valid).toBe(true);
      await expect(q.query(`UPDATE "analyses" SET "summary" = '[]'`)).rejects.toThrow(/immutable/);
    } finally {
      await q.release();
    }
  });
});
