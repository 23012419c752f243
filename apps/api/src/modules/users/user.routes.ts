import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { userPatchBody as patchSchema } from "@waymark/contract";
import { actorOf } from "../../http/actor.js";
import { ConflictError, NotFoundError } from "../../http/errors.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { recordAudit } from "../audit/audit.service.js";
import type { TypeormSessionStore } from "../sessions/typeorm-session-store.js";
import { toPublicUser, User } from "./user.entity.js";
import { inTransaction } from "../../db/in-transaction.js";

export function userRoutes(ds: DataSource, sessions: TypeormSessionStore): RouteSpec[] {
  return [
    {
      method: "get",
      path: "",
      policy: policy.roles("admin"),
      summary: "All user accounts",
      handlers: [
        async (_req, res) => {
          const users = await ds.getRepository(User).find({ order: { displayName: "ASC" } });
          res.json({
            users: users.map((u) => ({
              ...toPublicUser(u),
              lastSignInAt: u.lastSignInAt,
              createdAt: u.createdAt,
            })),
          });
        },
      ],
    },
    {
      method: "patch",
      path: "/:id",
      policy: policy.roles("admin"),
      summary: "Change a user's role or deactivate/reactivate the account",
      handlers: [
        async (req, res) => {
          const body = parseBody(patchSchema, req.body);
          const actor = actorOf(req);
          const id = Number(req.params.id);
          const saved = await inTransaction(ds, async (tx) => {
            const repo = tx.getRepository(User);
            const user = await repo.findOneBy({ id });
            if (!user) throw new NotFoundError(`There is no user ${id}.`);
            const losesAdmin =
              user.role === "admin" &&
              user.active &&
              ((body.role && body.role !== "admin") || body.active === false);
            if (losesAdmin && (await repo.countBy({ role: "admin", active: true })) <= 1) {
              throw new ConflictError("This is the last active admin; make someone else an admin first.");
            }
            const before = { role: user.role, active: user.active };
            if (body.role !== undefined) user.role = body.role;
            if (body.active !== undefined) user.active = body.active;
            await repo.save(user);
            if (body.role !== undefined && body.role !== before.role) {
              await recordAudit(tx, actor, {
                action: "user.role-changed",
                summary: `Changed ${user.email} from ${before.role} to ${user.role}`,
                before,
                after: { role: user.role },
              });
            }
            if (body.active !== undefined && body.active !== before.active) {
              await recordAudit(tx, actor, {
                action: user.active ? "user.reactivated" : "user.deactivated",
                summary: `${user.active ? "Reactivated" : "Deactivated"} ${user.email}`,
                before,
                after: { active: user.active },
              });
            }
            return user;
          });
          // A deactivated or re-roled account signs in again, so no session keeps old rights.
          if (body.active === false || body.role !== undefined) await sessions.destroyForUser(saved.id);
          res.json({ user: toPublicUser(saved) });
        },
      ],
    },
  ];
}
