/** Query keys of the studies feature, in one place so mutations invalidate the right ones. */
export const studyKeys = {
  all: ["studies"] as const,
  detail: (id: number) => ["studies", id] as const,
  datasets: (id: number) => ["studies", id, "datasets"] as const,
  checks: (id: number, datasetId: number) => ["studies", id, "checks", datasetId] as const,
  analyses: (id: number) => ["studies", id, "analyses"] as const,
  analysis: (id: number, analysisId: number) => ["studies", id, "analyses", analysisId] as const,
};
