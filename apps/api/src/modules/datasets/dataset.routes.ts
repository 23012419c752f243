import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { actorOf } from "../../http/actor.js";
import type { Env } from "../../config/env.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { runChecks } from "../analyses/analysis.service.js";
import { loadEditableStudy, loadReadableStudy } from "../studies/study.access.js";
import { Dataset } from "./dataset.entity.js";
import { presentDataset } from "./dataset.presenter.js";
import { columnChoiceSchema } from "./dataset.schema.js";
import { loadDatasetForAnalysis, previewUpload, storeDataset } from "./dataset.service.js";
import { activateDataset } from "./activate-dataset.js";
import { parseLevelMap } from "./match-plan.js";
import { activeDataset } from "../studies/study-status-records.js";
import { singleFileUpload } from "./upload-middleware.js";

const ANY_ROLE = policy.roles("analyst", "reviewer", "writer", "admin");
const ANALYST = policy.roles("analyst");

export function datasetRoutes(ds: DataSource, env: Env): RouteSpec[] {
  const upload = singleFileUpload(env.UPLOAD_LIMIT_MB);
  return [
    {
      method: "post",
      path: "/:id/datasets/preview",
      policy: ANALYST,
      summary: "Read an upload's columns and first rows without storing it",
      handlers: [
        upload,
        async (req, res) => {
          const study = await loadEditableStudy(ds, Number(req.params.id), req.user!);
          res.json(await previewUpload(req.file!, study));
        },
      ],
    },
    {
      method: "post",
      path: "/:id/datasets",
      policy: ANALYST,
      summary: "Upload a new dataset version (CSV or XLSX)",
      handlers: [
        upload,
        async (req, res) => {
          const choice = parseBody(columnChoiceSchema, req.body);
          const { dataset, study } = await storeDataset(
            ds,
            actorOf(req),
            Number(req.params.id),
            req.file!,
            choice,
            parseLevelMap((req.body as Record<string, unknown>).levelMap),
          );
          res.status(201).json({ dataset: presentDataset(dataset, study) });
        },
      ],
    },
    {
      method: "get",
      path: "/:id/datasets",
      policy: ANY_ROLE,
      summary: "All dataset versions of a study",
      handlers: [
        async (req, res) => {
          const study = await loadReadableStudy(ds, Number(req.params.id), req.user!);
          const rows = await ds
            .getRepository(Dataset)
            .find({ where: { studyId: study.id }, order: { version: "DESC" } });
          const active = await activeDataset(ds, study);
          // `active`: the version analyses and submissions use (see studies/study-status-records.ts).
          res.json({
            datasets: rows.map((d) => ({ ...presentDataset(d, study), active: d.id === active?.id })),
          });
        },
      ],
    },
    {
      method: "post",
      path: "/:id/datasets/:datasetId/activate",
      policy: ANALYST,
      summary: "Make a dataset version the active one again (draft only)",
      handlers: [
        async (req, res) => {
          const { dataset, study } = await activateDataset(
            ds,
            actorOf(req),
            Number(req.params.id),
            Number(req.params.datasetId),
          );
          res.json({ dataset: presentDataset(dataset, study) });
        },
      ],
    },
    {
      method: "get",
      path: "/:id/datasets/:datasetId/checks",
      policy: ANY_ROLE,
      summary: "Assumption checks and the recommended test for a dataset",
      handlers: [
        async (req, res) => {
          const study = await loadReadableStudy(ds, Number(req.params.id), req.user!);
          const dataset = await loadDatasetForAnalysis(ds, study.id, Number(req.params.datasetId));
          res.json({ datasetId: dataset.id, ...(await runChecks(study, dataset)) });
        },
      ],
    },
  ];
}
