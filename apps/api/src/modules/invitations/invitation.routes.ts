import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { acceptInvitationBody as acceptSchema, inviteBody as inviteSchema } from "@waymark/contract";
import type { Env } from "../../config/env.js";
import { actorOf } from "../../http/actor.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { Invitation } from "./invitation.entity.js";
import { acceptInvitation, findByToken, invite, stateOf } from "./invitation.service.js";

const present = (i: Invitation) => ({
  id: i.id,
  email: i.email,
  role: i.role,
  state: stateOf(i),
  createdAt: i.createdAt,
  expiresAt: i.expiresAt,
  invitedBy: i.invitedBy ? { id: i.invitedBy.id, displayName: i.invitedBy.displayName } : null,
});

export function invitationRoutes(ds: DataSource, env: Env): RouteSpec[] {
  return [
    {
      method: "post",
      path: "",
      policy: policy.roles("admin"),
      summary: "Invite a person by e-mail with a role",
      handlers: [
        async (req, res) => {
          const inv = await invite(ds, actorOf(req), parseBody(inviteSchema, req.body), env.publicUrl);
          res.status(201).json({ invitation: present(inv) });
        },
      ],
    },
    {
      method: "get",
      path: "",
      policy: policy.roles("admin"),
      summary: "All invitations",
      handlers: [
        async (_req, res) =>
          void res.json({
            invitations: (await ds.getRepository(Invitation).find({ order: { id: "DESC" } })).map(present),
          }),
      ],
    },
    {
      method: "get",
      path: "/:token",
      policy: policy.public,
      summary: "What an invitation link is for (or why it no longer works)",
      handlers: [
        async (req, res) => {
          const inv = await findByToken(ds, String(req.params.token));
          res.json({ invitation: { email: inv.email, role: inv.role, expiresAt: inv.expiresAt } });
        },
      ],
    },
    {
      method: "post",
      path: "/:token/accept",
      policy: policy.public,
      summary: "Accept an invitation: set name and password, and sign in",
      handlers: [
        async (req, res, next) => {
          const body = parseBody(acceptSchema, req.body);
          const user = await acceptInvitation(
            ds,
            String(req.params.token),
            body,
            env.BCRYPT_COST,
            req.ip ?? null,
          );
          req.logIn(user, { session: true, keepSessionInfo: true }, (err) =>
            err ? next(err) : res.status(201).json({ user }),
          );
        },
      ],
    },
  ];
}
