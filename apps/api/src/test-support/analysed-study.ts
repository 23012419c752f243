import type { signedIn } from "./agents.js";
import { lockedStudy } from "./locked-study.js";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** Invented yields of three lines, five values each. */
export const YIELD_CSV = [
  "Line,Yield (g)",
  ...[10.1, 11.3, 9.8, 10.6, 10.9].map((v) => `North,${v}`),
  ...[12.0, 12.9, 13.4, 12.2, 11.9].map((v) => `South,${v}`),
  ...[10.9, 11.8, 10.2, 11.1, 10.4].map((v) => `East,${v}`),
].join("\n");

/** A study with a locked plan, one dataset and one stored analysis; returns the ids. */
export async function analysedStudy(analyst: Agent) {
  const studyId = await lockedStudy(analyst);
  const up = await analyst
    .post(`/api/studies/${studyId}/datasets`)
    .field("groupColumn", "Line")
    .field("outcomeColumn", "Yield (g)")
    .attach("file", Buffer.from(YIELD_CSV), "yield.csv")
    .expect(201);
  const run = await analyst
    .post(`/api/studies/${studyId}/analyses`)
    .send({ datasetId: up.body.dataset.id })
    .expect(201);
  return { studyId, datasetId: up.body.dataset.id as number, analysisId: run.body.analysis.id as number };
}
