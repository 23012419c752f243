import type { DataSource } from "typeorm";
import { runAnalysis } from "../../modules/analyses/analysis.service.js";
import { storeDataset } from "../../modules/datasets/dataset.service.js";
import { Study } from "../../modules/studies/study.entity.js";
import { createStudy, lockPlan, saveDesign, savePlan } from "../../modules/studies/study.service.js";
import { User } from "../../modules/users/user.entity.js";
import { demoScenarios } from "./demo-data/scenarios.js";

/**
 * Seeds the three invented demo studies through the same services the API uses, each carried
 * from design to a stored analysis. Runs once: skipped when the demo analyst already has studies.
 */
export async function seedDemoStudies(ds: DataSource): Promise<void> {
  const analyst = await ds.getRepository(User).findOneBy({ email: "analyst@waymark.test" });
  if (!analyst) return;
  if (await ds.getRepository(Study).existsBy({ ownerId: analyst.id })) return;
  const actor = {
    user: {
      id: analyst.id,
      email: analyst.email,
      displayName: analyst.displayName,
      role: analyst.role,
      active: true,
    },
    ip: null,
  };
  for (const s of demoScenarios()) {
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
  }
}
