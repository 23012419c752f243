import { createHash } from "node:crypto";
import type { DataSource } from "typeorm";
import type { Actor } from "../../http/actor.js";
import { HttpError } from "../../http/errors.js";
import { recordAudit } from "../audit/audit.service.js";
import { loadEditableStudy } from "../studies/study.access.js";
import { Study } from "../studies/study.entity.js";
import { Dataset } from "./dataset.entity.js";
import { runTask } from "../../workers/task-pool.js";
import { guessColumns, type ColumnChoice } from "./extract-groups.js";
import { safeFileName } from "./upload-middleware.js";
import { inTransaction } from "../../db/in-transaction.js";
import { pauseAt } from "../../db/pause-points.js";
import { applyLevelMap, levelsToRead, requirePlanMatch, type LevelMap } from "./match-plan.js";

export interface UploadedFile {
  originalname: string;
  mimetype: string;
  buffer: Buffer;
  size: number;
}

export async function previewUpload(file: UploadedFile, study: Study) {
  const table = await runTask("previewTask", {
    fileName: safeFileName(file.originalname),
    bytes: file.buffer,
  });
  return {
    columns: table.columns,
    rows: table.head.slice(0, 8).map((r) => r.cells),
    rowCount: table.rowCount,
    format: table.format,
    guess: guessColumns({ columns: table.columns, rows: table.head, format: table.format }, study.levels),
  };
}

/**
 * Stores a new dataset version: parsed, checked against the plan's levels and written in one
 * transaction with the next version number. A file that cannot be analysed is refused with its
 * validation report, and nothing is stored.
 */
export async function storeDataset(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  file: UploadedFile,
  choice: ColumnChoice,
  levelMap: LevelMap = {},
): Promise<{ dataset: Dataset; study: Study }> {
  const user = actor.user;
  const study = await loadEditableStudy(ds, studyId, user);
  if (!study.planLockedAt)
    throw new HttpError(
      409,
      "plan_not_locked",
      "Lock the analysis plan before uploading data, so the plan is seen to come first.",
    );
  const fileName = safeFileName(file.originalname);
  // Parsing a large file is CPU work: it runs off the request thread.
  const extracted = await runTask("extractTask", {
    fileName,
    bytes: file.buffer,
    choice,
    levels: levelsToRead(study.levels, levelMap),
  });
  const { format } = extracted;
  const { data, report } = applyLevelMap(extracted.data, extracted.report, study.levels, levelMap);
  if (!report.usable) {
    throw new HttpError(
      422,
      "invalid_data",
      report.messages[0] ?? "The file holds no data that can be analysed.",
      { report },
    );
  }
  requirePlanMatch(report, study.levels, levelMap);
  const sha256 = createHash("sha256").update(file.buffer).digest("hex");
  await pauseAt("dataset.before-store");
  const dataset = await inTransaction(ds, async (tx) => {
    // Checked again inside the write: a submit or approval that landed during parsing wins.
    await loadEditableStudy(tx, studyId, user);
    const repo = tx.getRepository(Dataset);
    const last = await repo.findOne({
      where: { studyId },
      order: { version: "DESC" },
      select: { id: true, version: true },
    });
    const row = repo.create({
      studyId,
      version: (last?.version ?? 0) + 1,
      fileName,
      sizeBytes: file.size,
      sha256,
      mediaType:
        format === "xlsx" ? "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet" : "text/csv",
      content: file.buffer,
      layout: choice.layout,
      groupColumn: choice.layout === "long" ? (choice.groupColumn ?? null) : null,
      outcomeColumn: choice.layout === "long" ? (choice.outcomeColumn ?? null) : null,
      report,
      observations: data,
      uploadedById: user.id,
      uploadedAt: new Date(),
    });
    const saved = await repo.save(row);
    // A new upload becomes the active version (an earlier one can be made active again).
    await tx.getRepository(Study).update({ id: studyId }, { activeDatasetId: saved.id });
    await recordAudit(tx, actor, {
      action: "dataset.uploaded",
      studyId,
      summary: `Uploaded ${fileName} as version ${saved.version} (${report.rowsUsed} values in ${report.groupsFound.length} groups)`,
      after: {
        datasetId: saved.id,
        version: saved.version,
        sha256,
        sizeBytes: file.size,
        excluded: report.excludedCount,
      },
    });
    return repo.findOneByOrFail({ id: saved.id });
  });
  return { dataset, study };
}

/** A dataset with its stored values, verified against the SHA-256 recorded at upload. */
export async function loadDatasetForAnalysis(
  ds: DataSource,
  studyId: number,
  datasetId: number,
): Promise<Dataset> {
  const d = await ds
    .getRepository(Dataset)
    .createQueryBuilder("d")
    .addSelect(["d.observations", "d.content"])
    .leftJoinAndSelect("d.uploadedBy", "u")
    .where("d.id = :datasetId AND d.study_id = :studyId", { datasetId, studyId })
    .getOne();
  if (!d) throw new HttpError(404, "not_found", `Study ${studyId} has no dataset ${datasetId}.`);
  const actual = createHash("sha256").update(d.content).digest("hex");
  if (actual !== d.sha256) {
    throw new HttpError(
      500,
      "dataset_corrupt",
      `Dataset version ${d.version} no longer matches its recorded SHA-256; it will not be analysed. Upload the file again.`,
    );
  }
  return d;
}
