import { describe, expect, it } from "vitest";
import {
  ALPHA_MESSAGE,
  createStudyBody,
  LIMITS,
  planBody,
  powerBody,
  runAnalysisBody,
  settingsBody,
} from "./index.js";

const study = {
  title: "Cure schedules",
  objective: "Compare lap-shear strength.",
  outcomeName: "Strength",
  outcomeUnit: "MPa",
  factorName: "Cure",
  levels: ["A", "B", "C"],
  context: "general",
};

describe("contract", () => {
  it("checks α in one place with one message, wherever a body carries it", () => {
    // α above .20 is not a usual significance level: common practice.
    for (const [schema, body] of [
      [planBody, { alpha: 0.25 }],
      [settingsBody, { defaultAlpha: 0.25 }],
      [createStudyBody, { ...study, alpha: 0.25 }],
      [powerBody, { k: 3, effectF: 0.25, power: 0.8, alpha: 0.25 }],
    ] as const) {
      const r = schema.safeParse(body);
      expect(r.success).toBe(false);
      expect(r.error?.issues[0]?.message).toBe(ALPHA_MESSAGE);
    }
    expect(planBody.safeParse({ alpha: LIMITS.alphaMax }).success).toBe(true);
    expect(planBody.safeParse({ alpha: 0 }).success).toBe(false);
  });

  it("limits a title and an objective at the values in LIMITS", () => {
    expect(createStudyBody.safeParse({ ...study, title: "x".repeat(LIMITS.title) }).success).toBe(true);
    const long = createStudyBody.safeParse({ ...study, title: "x".repeat(LIMITS.title + 1) });
    expect(long.error?.issues[0]?.message).toBe(`Title must be at most ${LIMITS.title} characters`);
    expect(createStudyBody.safeParse({ ...study, objective: "x".repeat(LIMITS.objective + 1) }).success).toBe(
      false,
    );
  });

  it("accepts test ids only", () => {
    expect(runAnalysisBody.safeParse({ datasetId: 1, test: "welch" }).success).toBe(true);
    expect(runAnalysisBody.safeParse({ datasetId: 1, test: "Welch's ANOVA" }).success).toBe(false);
  });
});
