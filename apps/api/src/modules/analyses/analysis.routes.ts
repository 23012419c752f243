import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { actorOf } from "../../http/actor.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { Dataset } from "../datasets/dataset.entity.js";
import { loadReadableStudy } from "../studies/study.access.js";
import { Analysis } from "./analysis.entity.js";
import { runAnalysisSchema } from "./analysis.schema.js";
import { loadAnalysis, presentAnalysis } from "./analysis.service.js";
import type { AnalysisRunner } from "./runs/analysis-runner.js";

const ANY_ROLE = policy.roles("analyst", "reviewer", "writer", "admin");

export function analysisRoutes(ds: DataSource, runs: AnalysisRunner): RouteSpec[] {
  const versionOf = async (datasetId: number) =>
    (
      await ds
        .getRepository(Dataset)
        .findOne({ where: { id: datasetId }, select: { id: true, version: true } })
    )?.version;
  return [
    {
      method: "post",
      path: "/:id/analyses",
      policy: policy.roles("analyst"),
      summary: "Run the locked plan on a dataset version and store the result",
      handlers: [
        async (req, res) => {
          // A run row this instance claims and computes; it outlives this instance if it dies.
          const a = await runs.request(
            actorOf(req),
            Number(req.params.id),
            parseBody(runAnalysisSchema, req.body),
          );
          res.status(201).json({ analysis: presentAnalysis(a, await versionOf(a.datasetId)) });
        },
      ],
    },
    {
      method: "get",
      path: "/:id/analyses",
      policy: ANY_ROLE,
      summary: "All stored analyses of a study",
      handlers: [
        async (req, res) => {
          const study = await loadReadableStudy(ds, Number(req.params.id), req.user!);
          const list = await ds
            .getRepository(Analysis)
            .find({ where: { studyId: study.id }, order: { id: "DESC" } });
          res.json({
            analyses: await Promise.all(
              list.map(async (a) => presentAnalysis(a, await versionOf(a.datasetId))),
            ),
          });
        },
      ],
    },
    {
      method: "get",
      path: "/:id/analyses/:analysisId",
      policy: ANY_ROLE,
      summary: "One stored analysis",
      handlers: [
        async (req, res) => {
          const a = await loadAnalysis(ds, req.user!, Number(req.params.id), Number(req.params.analysisId));
          res.json({ analysis: presentAnalysis(a, await versionOf(a.datasetId)) });
        },
      ],
    },
  ];
}
