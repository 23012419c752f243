import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { actorOf } from "../../http/actor.js";
import type { RouteSpec } from "../../http/route-table.js";
import { AuditEvent } from "../audit/audit-event.entity.js";
import { recordAudit } from "../audit/audit.service.js";
import { loadSettings } from "../organization/organization.routes.js";
import { loadReadableStudy } from "../studies/study.access.js";
import { statusOf } from "../studies/study-status-records.js";
import { renderDocx } from "./render-docx.js";
import { generateReport, previewBlocks } from "./report.service.js";

const ANY_ROLE = policy.roles("analyst", "reviewer", "writer", "admin");
const isDraft = (q: unknown) => (q as { draft?: string }).draft === "1";

const fileName = (title: string, draft: boolean) =>
  `${
    title
      .replace(/[^\p{L}\p{N}]+/gu, "-")
      .replace(/^-|-$/g, "")
      .slice(0, 60) || "study"
  }${draft ? "-DRAFT" : ""}-methods-results.docx`;

export function reportRoutes(ds: DataSource): RouteSpec[] {
  return [
    {
      method: "get",
      path: "/:id/report/preview",
      policy: ANY_ROLE,
      summary: "The report's content for the HTML preview (approved, or ?draft=1 for the analyst)",
      handlers: [
        async (req, res) => {
          const draft = isDraft(req.query) || req.user!.role === "analyst";
          const r = await generateReport(ds, actorOf(req), Number(req.params.id), draft);
          const study = await loadReadableStudy(ds, Number(req.params.id), req.user!);
          res.json({
            report: { blocks: previewBlocks(r) },
            approved: !r.draft,
            draft: r.draft,
            progress: await statusOf(ds, study),
          });
        },
      ],
    },
    {
      method: "get",
      path: "/:id/report.docx",
      policy: ANY_ROLE,
      summary: "Download the methods-and-results section as DOCX (approved; ?draft=1 for the analyst)",
      handlers: [
        async (req, res) => {
          const actor = actorOf(req);
          const id = Number(req.params.id);
          const draft = isDraft(req.query);
          const r = await generateReport(ds, actor, id, draft);
          const { paperSize } = await loadSettings(ds);
          const buf = await renderDocx(r.blocks, { draft, paperSize, title: r.title, images: r.images });
          await recordAudit(ds, actor, {
            action: "report.downloaded",
            studyId: id,
            summary: `Downloaded the ${draft ? "draft " : ""}report (${paperSize})`,
            after: { draft, bytes: buf.length },
          });
          res.setHeader(
            "content-type",
            "application/vnd.openxmlformats-officedocument.wordprocessingml.document",
          );
          res.setHeader("content-disposition", `attachment; filename="${fileName(r.title, draft)}"`);
          res.send(buf);
        },
      ],
    },
    {
      method: "get",
      path: "/:id/report/exports",
      policy: policy.roles("reviewer", "writer", "admin", "analyst"),
      summary: "Past report downloads of a study",
      handlers: [
        async (req, res) => {
          const study = await loadReadableStudy(ds, Number(req.params.id), req.user!);
          const events = await ds
            .getRepository(AuditEvent)
            .find({ where: { studyId: study.id, action: "report.downloaded" }, order: { id: "DESC" } });
          res.json({
            exports: events.map((e) => ({
              id: e.id,
              at: e.at,
              actorEmail: e.actorEmail,
              draft: !!(e.after as { draft?: boolean } | null)?.draft,
            })),
          });
        },
      ],
    },
  ];
}
