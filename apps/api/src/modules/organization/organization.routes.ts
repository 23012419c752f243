import type { DataSource, EntityManager } from "typeorm";
import { policy } from "../../auth/policy.js";
import { actorOf } from "../../http/actor.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { recordAudit } from "../audit/audit.service.js";
import { settingsBody as settingsSchema } from "@waymark/contract";
import { OrganizationSettings } from "./organization-settings.entity.js";
import { inTransaction } from "../../db/in-transaction.js";

export async function loadSettings(db: DataSource | EntityManager): Promise<OrganizationSettings> {
  return db.getRepository(OrganizationSettings).findOneByOrFail({ id: 1 });
}

const present = (s: OrganizationSettings) => ({
  policy: s.policy,
  defaultAlpha: s.defaultAlpha,
  defaultAdjust: s.defaultAdjust,
  paperSize: s.paperSize,
  updatedAt: s.updatedAt,
});

export function organizationRoutes(ds: DataSource): RouteSpec[] {
  return [
    {
      method: "get",
      path: "/settings",
      policy: policy.signedIn,
      summary: "The organization's test policy and defaults",
      handlers: [async (_req, res) => void res.json({ settings: present(await loadSettings(ds)) })],
    },
    {
      method: "put",
      path: "/settings",
      policy: policy.roles("admin"),
      summary: "Set the test policy, default α and adjustment, paper size",
      handlers: [
        async (req, res) => {
          const body = parseBody(settingsSchema, req.body);
          const saved = await inTransaction(ds, async (tx) => {
            const s = await loadSettings(tx);
            const before = present(s);
            Object.assign(s, body);
            await tx.getRepository(OrganizationSettings).save(s);
            await recordAudit(tx, actorOf(req), {
              action: "organization.settings-changed",
              summary: `Changed ${Object.keys(body).join(", ")}`,
              before,
              after: body,
            });
            return s;
          });
          res.json({ settings: present(saved) });
        },
      ],
    },
  ];
}
