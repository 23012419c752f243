import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import type { RouteSpec } from "../../http/route-table.js";
import { ReceivedMessage } from "./received-message.entity.js";

/** The dev mailbox: what the local fake SMTP server caught. Mounted only in demo mode and tests. */
export function devMailRoutes(ds: DataSource): RouteSpec[] {
  return [
    {
      method: "get",
      path: "/mail",
      policy: policy.public,
      summary: "Messages caught by the fake mail server (demo mode and tests only)",
      handlers: [
        async (_req, res) =>
          void res.json({
            messages: await ds.getRepository(ReceivedMessage).find({ order: { id: "DESC" }, take: 200 }),
          }),
      ],
    },
  ];
}
