import type { DataSource, EntityManager } from "typeorm";
import { Analysis } from "../analyses/analysis.entity.js";
import { Dataset } from "../datasets/dataset.entity.js";
import type { ReviewRound } from "./review-round.entity.js";
import type { RoundRecord } from "./round-changes.js";

/** What each round froze, for the "what changed" summary (one read of analyses and versions). */
export async function roundRecords(
  ds: DataSource | EntityManager,
  rounds: ReviewRound[],
): Promise<RoundRecord[]> {
  if (rounds.length < 2) return [];
  const analyses = await ds.getRepository(Analysis).find({
    where: rounds.map((r) => ({ id: r.analysisId })),
    select: { id: true, chosenTest: true, posthocMethod: true, overrideJustification: true, result: true },
  });
  const datasets = await ds.getRepository(Dataset).find({
    where: rounds.map((r) => ({ id: r.datasetId })),
    select: { id: true, version: true },
  });
  return rounds.map((r) => {
    const a = analyses.find((x) => x.id === r.analysisId)!;
    return {
      round: r.round,
      analysisId: r.analysisId,
      datasetVersion: datasets.find((d) => d.id === r.datasetId)?.version ?? 0,
      chosenTest: a.chosenTest,
      posthocMethod: a.posthocMethod,
      deviation: a.overrideJustification,
      result: a.result,
    };
  });
}
