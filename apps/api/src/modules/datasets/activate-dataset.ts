import type { DataSource } from "typeorm";
import { inTransaction } from "../../db/in-transaction.js";
import type { Actor } from "../../http/actor.js";
import { NotFoundError } from "../../http/errors.js";
import { recordAudit } from "../audit/audit.service.js";
import { activeDataset } from "../studies/study-status-records.js";
import { loadEditableStudy } from "../studies/study.access.js";
import { Study } from "../studies/study.entity.js";
import { Dataset } from "./dataset.entity.js";

/**
 * Makes an earlier (or any) data version the active one: analyses and the submission then use
 * it. Draft studies only, checked inside the write; audited with the versions before and after.
 */
export async function activateDataset(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  datasetId: number,
): Promise<{ dataset: Dataset; study: Study }> {
  return inTransaction(ds, async (tx) => {
    const study = await loadEditableStudy(tx, studyId, actor.user);
    const dataset = Number.isInteger(datasetId)
      ? await tx.getRepository(Dataset).findOneBy({ id: datasetId, studyId })
      : null;
    if (!dataset) throw new NotFoundError(`Study ${studyId} has no dataset ${datasetId}.`);
    const before = await activeDataset(tx, study);
    await tx.getRepository(Study).update({ id: studyId }, { activeDatasetId: dataset.id });
    await recordAudit(tx, actor, {
      action: "dataset.activated",
      studyId,
      summary: `Made data version ${dataset.version} active${before ? ` (was version ${before.version})` : ""}`,
      before: { datasetId: before?.id ?? null, version: before?.version ?? null },
      after: { datasetId: dataset.id, version: dataset.version },
    });
    return { dataset, study: await tx.getRepository(Study).findOneByOrFail({ id: studyId }) };
  });
}
