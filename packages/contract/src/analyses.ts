import { z } from "zod";
import type { AnalysisResult, Reading } from "@waymark/stats";
import { person, timestamp } from "./common.js";
import { omnibusTest, posthocFamily } from "./enums.js";
import { LIMITS } from "./limits.js";

export const runAnalysisBody = z.object({
  datasetId: z.number().int().positive("datasetId must be a dataset of this study"),
  test: omnibusTest.optional(),
  justification: z.string().trim().max(LIMITS.maxJustification).optional(),
});
export type RunAnalysisBody = z.infer<typeof runAnalysisBody>;

/**
 * The engine's result, typed by @waymark/stats (AnalysisResult) and checked here only for its
 * top-level parts: the engine's own tests pin every field; the contract guards the wire.
 */
const RESULT_PARTS = [
  "engineVersion",
  "options",
  "data",
  "groups",
  "anova",
  "welch",
  "kruskalWallis",
  "levene",
  "brownForsythe",
  "bartlett",
  "shapiroWilk",
  "shapiroWilkResiduals",
  "sdRatio",
  "outliers",
  "qq",
  "posthoc",
  "familyWiseError",
  "recommendation",
  "warnings",
] as const satisfies readonly (keyof AnalysisResult)[];

export const analysisResult = z.custom<AnalysisResult>(
  (x) => !!x && typeof x === "object" && RESULT_PARTS.every((k) => k in x),
  "not an analysis result",
);

export const analysisDto = z.object({
  id: z.number(),
  studyId: z.number(),
  datasetId: z.number(),
  datasetVersion: z.number().nullable(),
  engineVersion: z.string(),
  createdAt: timestamp,
  createdBy: person.nullable(),
  /** The primary test under the locked plan (after the plan's own rule, if it named one). */
  plannedTest: omnibusTest,
  /** The test that was run: the planned one, or another as a justified deviation from the plan. */
  chosenTest: omnibusTest,
  posthocMethod: posthocFamily,
  deviation: z.object({ justification: z.string() }).nullable(),
  planSnapshot: z.record(z.string(), z.unknown()),
  result: analysisResult,
  summary: z.array(z.string()),
});
export type AnalysisDto = z.infer<typeof analysisDto>;

export const analysisResponse = z.object({ analysis: analysisDto });
export const analysisListResponse = z.object({ analyses: z.array(analysisDto) });

export const checkReading = z.custom<Reading>(
  (x) => !!x && typeof x === "object" && "key" in x && "level" in x && "text" in x,
);

export const checksResponse = z.object({
  datasetId: z.number(),
  checks: analysisResult,
  readings: z.array(checkReading),
  /** The values read per group, for the plots. */
  observations: z
    .object({
      groups: z.array(
        z.object({
          name: z.string(),
          values: z.array(z.union([z.string(), z.number()])),
          rows: z.array(z.number()).optional(),
        }),
      ),
    })
    .nullable(),
});
export type ChecksResponse = z.infer<typeof checksResponse>;
