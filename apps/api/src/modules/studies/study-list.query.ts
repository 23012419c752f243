import type { DataSource } from "typeorm";
import { Dataset } from "../datasets/dataset.entity.js";
import type { User } from "../users/user.entity.js";
import { Study } from "./study.entity.js";
import { presentStudy, type StudyDto } from "./study.presenter.js";

/**
 * The studies a user may list, newest change first, each with its dataset count, latest dataset
 * and latest analysis: four queries however many studies there are (one per study before made
 * the list the slowest read in the API).
 */
export async function listStudies(ds: DataSource, user: Pick<User, "id" | "role">): Promise<StudyDto[]> {
  const studies = await ds.getRepository(Study).find({
    where: user.role === "analyst" ? { ownerId: user.id } : {},
    order: { updatedAt: "DESC" },
  });
  if (studies.length === 0) return [];
  // The same filter as a subquery, so the number of studies never meets SQLite's parameter limit.
  const mine =
    user.role === "analyst" ? "SELECT id FROM studies WHERE owner_id = ?" : "SELECT id FROM studies";
  const params = user.role === "analyst" ? [user.id] : [];

  const [datasetRows, analysisRows] = await Promise.all([
    ds.query(
      `SELECT study_id AS studyId, COUNT(*) AS n, MAX(version) AS version FROM datasets
       WHERE study_id IN (${mine}) GROUP BY study_id`,
      params,
    ) as Promise<{ studyId: number; n: number; version: number }[]>,
    ds.query(
      `SELECT study_id AS studyId, MAX(id) AS id FROM analyses WHERE study_id IN (${mine}) GROUP BY study_id`,
      params,
    ) as Promise<{ studyId: number; id: number }[]>,
  ]);
  const counts = new Map(datasetRows.map((r) => [r.studyId, r]));
  const latestAnalysis = new Map(analysisRows.map((r) => [r.studyId, r.id]));

  // Latest datasets by (study, version), the unique key; content and observations stay unread.
  const latest = new Map<number, Dataset>();
  if (datasetRows.length > 0) {
    const found = await ds
      .getRepository(Dataset)
      .createQueryBuilder("d")
      .leftJoinAndSelect("d.uploadedBy", "u")
      .where(`d.study_id IN (${mine.replace("?", ":owner")})`, { owner: user.id })
      .andWhere("d.version = (SELECT MAX(d2.version) FROM datasets d2 WHERE d2.study_id = d.study_id)")
      .getMany();
    for (const d of found) latest.set(d.studyId, d);
  }
  return studies.map((s) =>
    presentStudy(s, {
      datasetCount: Number(counts.get(s.id)?.n ?? 0),
      latestDataset: latest.get(s.id) ?? null,
      latestAnalysisId: latestAnalysis.get(s.id) ?? null,
    }),
  );
}
