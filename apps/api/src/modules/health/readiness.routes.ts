import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { HttpError } from "../../http/errors.js";
import type { RouteSpec } from "../../http/route-table.js";
import { isDraining, onShutdown } from "../../lifecycle/shutdown.js";
import { DATABASE_TIMEOUT_MS, databaseProbe } from "./database-probe.js";

/**
 * Readiness, for a load balancer: 200 while this instance can serve, 503 while it is shutting
 * down (lifecycle/shutdown.ts) or cannot reach the database. `/api/health` stays a liveness check
 * that touches nothing. The database check (database-probe.ts) measures the database, not the wait
 * for a pooled connection; its own connection is closed with the other shutdown steps.
 */
export function readinessRoutes(ds: DataSource): RouteSpec[] {
  const probe = databaseProbe(ds);
  onShutdown("Closing the readiness probe's connection", () => probe.close());
  return [
    {
      method: "get",
      path: "",
      policy: policy.public,
      summary: "Readiness for a load balancer: 503 while shutting down or without the database",
      handlers: [
        async (_req, res) => {
          res.set("Cache-Control", "no-store");
          if (isDraining())
            throw new HttpError(503, "draining", "This instance is shutting down; send requests to another.");
          if (!(await probe.answers()))
            throw new HttpError(
              503,
              "database_unreachable",
              `This instance cannot reach its database (no answer within ${DATABASE_TIMEOUT_MS / 1000} s).`,
            );
          res.json({ status: "ready" });
        },
      ],
    },
  ];
}
