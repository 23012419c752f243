import {
  analysisListResponse,
  analysisResponse,
  checksResponse,
  datasetListResponse,
  powerResponse,
  reportPreview,
  reviewQueueResponse,
  settingsResponse,
  studyHistory,
  studyListResponse,
  studyResponse,
} from "@waymark/contract";
import { beforeAll, describe, expect, it } from "vitest";
import type { z } from "zod";
import { signedIn } from "../test-support/agents.js";
import { analysedStudy } from "../test-support/analysed-study.js";
import { makeTestApp } from "../test-support/test-app.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let reviewer: Awaited<ReturnType<typeof signedIn>>;

/** Parses a body with its contract schema; a mismatch fails with the path of the first problem. */
function parses<S extends z.ZodType>(schema: S, body: unknown): z.infer<S> {
  const r = schema.safeParse(body);
  if (!r.success)
    throw new Error(`response does not match the contract: ${JSON.stringify(r.error.issues[0])}`);
  return r.data;
}

beforeAll(async () => {
  t = await makeTestApp();
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
});

describe("responses match @waymark/contract", () => {
  it("study, datasets, checks, analyses, review and report bodies parse with their schemas", async () => {
    const { studyId, datasetId, analysisId } = await analysedStudy(analyst);
    const study = parses(studyResponse, (await analyst.get(`/api/studies/${studyId}`).expect(200)).body);
    // Records and responses carry ids, which the vocabulary names (common practice: ids on the wire).
    expect(study.study.plan.plannedPosthoc).toBe("tukey-kramer");
    parses(studyListResponse, (await analyst.get("/api/studies").expect(200)).body);
    parses(datasetListResponse, (await analyst.get(`/api/studies/${studyId}/datasets`).expect(200)).body);
    parses(
      checksResponse,
      (await analyst.get(`/api/studies/${studyId}/datasets/${datasetId}/checks`).expect(200)).body,
    );
    const one = parses(
      analysisResponse,
      (await analyst.get(`/api/studies/${studyId}/analyses/${analysisId}`).expect(200)).body,
    );
    expect(one.analysis.posthocMethod).toBe("tukey-kramer");
    parses(analysisListResponse, (await analyst.get(`/api/studies/${studyId}/analyses`).expect(200)).body);
    await analyst.post(`/api/studies/${studyId}/submit`).send({}).expect(200);
    parses(reviewQueueResponse, (await reviewer.get("/api/reviews/queue").expect(200)).body);
    parses(studyHistory, (await reviewer.get(`/api/studies/${studyId}/history`).expect(200)).body);
    const preview = parses(
      reportPreview,
      (await analyst.get(`/api/studies/${studyId}/report/preview?draft=1`).expect(200)).body,
    );
    const table = preview.report.blocks.find((b) => b.type === "table" && b.caption.startsWith("Table 2"));
    expect(table && "caption" in table ? table.caption : "").toBe(
      "Table 2. Tukey–Kramer comparisons of all pairs",
    );
  });

  it("power and settings bodies parse with their schemas", async () => {
    parses(
      powerResponse,
      (await analyst.post("/api/power").send({ k: 3, effectF: 0.25, power: 0.8 }).expect(200)).body,
    );
    parses(settingsResponse, (await analyst.get("/api/organization/settings").expect(200)).body);
  });
});
