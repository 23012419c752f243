import type { DataSource } from "typeorm";
import { runAnalysis } from "../../modules/analyses/analysis.service.js";
import { storeDataset } from "../../modules/datasets/dataset.service.js";
import { approve, requestChanges, submitForReview } from "../../modules/reviews/review.service.js";
import { Study } from "../../modules/studies/study.entity.js";
import { createStudy, lockPlan, saveDesign, savePlan } from "../../modules/studies/study.service.js";
import { User } from "../../modules/users/user.entity.js";
import { demoScenarios, type DemoScenario } from "./demo-data/scenarios.js";

/** Where each demo study is left, so every role has something to do on first sign-in. */
export const DEMO_STAGES = {
  "Compressive strength of test cylinders under four curing methods": "approved",
  "Call handling time under three routing rules": "in-review",
  "Seedling height under three light schedules": "changes-requested",
} as const;

/** An invented study still being planned: design answered, plan saved but not locked. */
export const DEMO_DRAFT = {
  title: "Drying time of a primer coat at three humidity settings",
  objective:
    "Find out whether the relative humidity in the spray booth changes how long the primer takes to become touch-dry, before the booth's settings are fixed.",
  outcomeName: "Touch-dry time",
  outcomeUnit: "min",
  factorName: "Relative humidity",
  levels: ["40 %", "55 %", "70 %"],
  controlLevel: null,
  context: "general" as const,
  design: {
    independence: "independent" as const,
    scale: "continuous" as const,
    question: "means" as const,
    groupSizes: "equal" as const,
    hasControl: "no" as const,
    comparisons: "all-pairs" as const,
    assignment: "randomized" as const,
  },
};

/** The reviewer's invented comments on the study sent back. */
const SENT_BACK = {
  comment: "Please say how the two bolted plants are handled before I can sign this.",
  stepComments: [
    {
      step: "data" as const,
      body: "Two plants (16 h and 20 h light) are far taller than the rest; state whether they stay in, and why.",
    },
    {
      step: "results" as const,
      body: "Give the shift of each schedule against 12 h light with its interval, not only the p-values.",
    },
  ],
};

const BASE_URL = "http://localhost:3000";

type ActorOf = (u: User) => { user: Express.User; ip: null };
const actorOf: ActorOf = (u) => ({
  user: { id: u.id, email: u.email, displayName: u.displayName, role: u.role, active: true } as Express.User,
  ip: null,
});

/**
 * Seeds the invented demo studies through the same services the API uses, so the first
 * sign-in shows the whole life cycle: one study being planned (draft), one awaiting review,
 * one sent back with comments at the steps they concern, and one approved with its report.
 * The approval signs with the reviewer's demo password, as a person would. Runs once:
 * skipped when the demo analyst already has studies.
 */
export async function seedDemoStudies(ds: DataSource, reviewerPassword: string): Promise<void> {
  const users = ds.getRepository(User);
  const analystUser = await users.findOneBy({ email: "analyst@waymark.test" });
  const reviewerUser = await users.findOneBy({ email: "reviewer@waymark.test" });
  if (!analystUser || !reviewerUser) return;
  if (await ds.getRepository(Study).existsBy({ ownerId: analystUser.id })) return;
  const analyst = actorOf(analystUser);
  const reviewer = actorOf(reviewerUser);

  for (const s of demoScenarios()) {
    const studyId = await analysedScenario(ds, analyst, s);
    const stage = DEMO_STAGES[s.title as keyof typeof DEMO_STAGES];
    if (!stage) continue;
    await submitForReview(ds, analyst, studyId, undefined, BASE_URL);
    if (stage === "approved")
      await approve(
        ds,
        reviewer,
        studyId,
        { password: reviewerPassword, meaning: "Approved as the analysis of record" },
        BASE_URL,
      );
    if (stage === "changes-requested") await requestChanges(ds, reviewer, studyId, SENT_BACK, BASE_URL);
  }

  const { design, ...details } = DEMO_DRAFT;
  const draft = await createStudy(ds, analyst, details);
  await saveDesign(ds, analyst, draft.id, design);
  await savePlan(ds, analyst, draft.id, { power: { effectF: 0.4, targetPower: 0.8 } });
}

/** A scenario carried from design to a stored analysis; returns the study's id. */
async function analysedScenario(
  ds: DataSource,
  actor: ReturnType<ActorOf>,
  s: DemoScenario,
): Promise<number> {
  const study = await createStudy(ds, actor, {
    title: s.title,
    objective: s.objective,
    outcomeName: s.outcomeName,
    outcomeUnit: s.outcomeUnit,
    factorName: s.factorName,
    levels: s.levels,
    controlLevel: s.controlLevel,
    context: s.context,
  });
  await saveDesign(ds, actor, study.id, s.design);
  await savePlan(ds, actor, study.id, { power: { effectF: s.effectF, targetPower: 0.8 } });
  await lockPlan(ds, actor, study.id);
  const bytes = Buffer.from(s.csv, "utf8");
  const [groupColumn, outcomeColumn] = s.csv
    .split("\n")[0]!
    .split(",")
    .map((h) => h.replace(/^"|"$/g, ""));
  const { dataset } = await storeDataset(
    ds,
    actor,
    study.id,
    { originalname: s.fileName, mimetype: "text/csv", buffer: bytes, size: bytes.length },
    { layout: "long", groupColumn, outcomeColumn },
  );
  await runAnalysis(ds, actor, study.id, { datasetId: dataset.id });
  return study.id;
}
