// What one analyst does in the two-instance test and the benchmark: a study with a locked plan,
// uploads of invented yields, an analysis run, reads. Every value is from a seeded generator.
import type { Client, Reply } from "./client.js";

export const UPLOAD_FIELDS = { groupColumn: "Line", outcomeColumn: "Yield (g)" };
const LEVELS = ["North", "South", "East"];

/** A small fixed LCG, so every run uploads the same bytes for the same seed. */
function lcg(seed: number) {
  let state = (seed * 2654435761) >>> 0 || 1;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

/** Invented yields of three lines, `perGroup` values each (a sum of four uniforms, roughly bell-shaped). */
export function yieldCsv(seed: number, perGroup = 8): Buffer {
  const u = lcg(seed);
  const means = [10.5, 12.4, 10.9];
  const lines = ["Line,Yield (g)"];
  for (let i = 0; i < perGroup * LEVELS.length; i++) {
    const g = i % LEVELS.length;
    lines.push(`${LEVELS[g]},${(means[g]! + (u() + u() + u() + u() - 2) * 1.5).toFixed(3)}`);
  }
  return Buffer.from(`${lines.join("\n")}\n`, "utf8");
}

/** Creates a study with a complete design and a locked plan; returns its id. */
export async function lockedStudy(c: Client, title: string): Promise<number> {
  const { study } = await c.json<{ study: { id: number } }>(
    "POST",
    "/api/studies",
    {
      title,
      objective: "Compare the yield of three lines (invented data for the two-instance test).",
      outcomeName: "Yield",
      outcomeUnit: "g",
      factorName: "Line",
      levels: LEVELS,
      controlLevel: null,
      context: "general",
    },
    201,
  );
  await c.json(
    "PUT",
    `/api/studies/${study.id}/design`,
    {
      independence: "independent",
      scale: "continuous",
      question: "means",
      groupSizes: "equal",
      hasControl: "no",
      comparisons: "all-pairs",
      assignment: "randomized",
    },
    200,
  );
  await c.json("POST", `/api/studies/${study.id}/plan/lock`, undefined, 200);
  return study.id;
}

export async function uploadDataset(c: Client, studyId: number, csv: Buffer, baseUrl?: string) {
  const r = await c.upload(`/api/studies/${studyId}/datasets`, csv, "yields.csv", UPLOAD_FIELDS, baseUrl);
  if (r.status !== 201) throw new Error(`upload to study ${studyId}: ${r.status} ${r.text.slice(0, 300)}`);
  return (r.body as { dataset: { id: number; version: number } }).dataset;
}

/**
 * Runs the locked plan on a dataset version. Answers 201 with the stored analysis; a reply of 202
 * (the run queued as a row another instance may take) is followed until the analysis is stored.
 */
export async function runAnalysis(
  c: Client,
  studyId: number,
  datasetId: number,
  baseUrl?: string,
): Promise<{ reply: Reply; analysisId: number | null }> {
  const reply = await c.request(
    "POST",
    `/api/studies/${studyId}/analyses`,
    JSON.stringify({ datasetId }),
    { "content-type": "application/json" },
    baseUrl,
  );
  const analysis = (reply.body as { analysis?: { id: number } }).analysis;
  return { reply, analysisId: analysis?.id ?? null };
}

/** The reads a person makes while working: the list, the study, its versions and analyses. */
export async function readAround(c: Client, studyId: number): Promise<Reply[]> {
  return [
    await c.request("GET", "/api/studies"),
    await c.request("GET", `/api/studies/${studyId}`),
    await c.request("GET", `/api/studies/${studyId}/datasets`),
    await c.request("GET", `/api/studies/${studyId}/analyses`),
  ];
}
