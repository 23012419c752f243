import type { DataSource } from "typeorm";
import { z } from "zod";
import { policy } from "../../auth/policy.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { AuditEvent } from "./audit-event.entity.js";
import { toCsv } from "./audit-csv.js";

const filterSchema = z.object({
  studyId: z.coerce.number().int().positive().optional(),
  actor: z.string().max(254).optional(),
  action: z.string().max(60).optional(),
  from: z.iso.datetime({ offset: true, local: true }).or(z.iso.date()).optional(),
  to: z.iso.datetime({ offset: true, local: true }).or(z.iso.date()).optional(),
  limit: z.coerce.number().int().min(1).max(5000).default(500),
});

/** Reads the audit trail. There is deliberately no route that changes it. */
export function auditRoutes(ds: DataSource): RouteSpec[] {
  const query = (raw: unknown) => {
    const f = parseBody(filterSchema, raw);
    const q = ds.getRepository(AuditEvent).createQueryBuilder("e").orderBy("e.id", "DESC").take(f.limit);
    if (f.studyId) q.andWhere("e.study_id = :studyId", { studyId: f.studyId });
    if (f.actor) q.andWhere("lower(e.actor_email) LIKE :actor", { actor: `%${f.actor.toLowerCase()}%` });
    if (f.action) q.andWhere("e.action = :action", { action: f.action });
    if (f.from) q.andWhere("e.at >= :from", { from: new Date(f.from) });
    if (f.to)
      q.andWhere("e.at <= :to", { to: new Date(f.to.length === 10 ? `${f.to}T23:59:59.999Z` : f.to) });
    return q.getMany();
  };
  const present = (e: AuditEvent) => ({
    id: e.id,
    at: e.at,
    actorId: e.actorId,
    actorEmail: e.actorEmail,
    action: e.action,
    studyId: e.studyId,
    ip: e.ip,
    summary: e.summary,
    before: e.before,
    after: e.after,
  });
  return [
    {
      method: "get",
      path: "",
      policy: policy.roles("reviewer", "admin"),
      summary: "Filter the audit trail (studyId, actor, action, from, to)",
      handlers: [async (req, res) => void res.json({ events: (await query(req.query)).map(present) })],
    },
    {
      method: "get",
      path: "/export.csv",
      policy: policy.roles("reviewer", "admin"),
      summary: "The filtered audit trail as CSV, formula-safe",
      handlers: [
        async (req, res) => {
          const events = await query(req.query);
          const csv = toCsv(
            ["id", "at", "actor", "action", "study", "ip", "summary"],
            events.map((e) => [
              e.id,
              new Date(e.at).toISOString(),
              e.actorEmail,
              e.action,
              e.studyId,
              e.ip,
              e.summary,
            ]),
          );
          res.setHeader("content-type", "text/csv; charset=utf-8");
          res.setHeader("content-disposition", 'attachment; filename="waymark-audit.csv"');
          res.send(csv);
        },
      ],
    },
  ];
}
