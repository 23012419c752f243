import type { signedIn } from "./agents.js";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** Design answers that lead to a plan every fixture can lock: means of three independent groups. */
export const FIXTURE_DESIGN = {
  independence: "independent",
  scale: "continuous",
  question: "means",
  groupSizes: "equal",
  hasControl: "no",
  comparisons: "all-pairs",
  assignment: "randomized",
} as const;

/** Creates a study with a complete design and a locked plan; returns its id. */
export async function lockedStudy(analyst: Agent, overrides: Record<string, unknown> = {}): Promise<number> {
  const { body } = await analyst
    .post("/api/studies")
    .send({
      title: "Fixture study",
      objective: "Test fixture.",
      outcomeName: "Yield",
      outcomeUnit: "g",
      factorName: "Line",
      levels: ["North", "South", "East"],
      controlLevel: null,
      context: "general",
      ...overrides,
    })
    .expect(201);
  const id: number = body.study.id;
  await analyst.put(`/api/studies/${id}/design`).send(FIXTURE_DESIGN).expect(200);
  await analyst.post(`/api/studies/${id}/plan/lock`).expect(200);
  return id;
}
