import { policy } from "../../auth/policy.js";
import type { RouteSpec } from "../../http/route-table.js";
import { APP_VERSION } from "../../version.js";

export function healthRoutes(): RouteSpec[] {
  return [
    {
      method: "get",
      path: "",
      policy: policy.public,
      summary: "Liveness and version",
      handlers: [(_req, res) => void res.json({ status: "ok", version: APP_VERSION })],
    },
  ];
}
