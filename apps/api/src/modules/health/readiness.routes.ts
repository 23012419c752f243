import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { HttpError } from "../../http/errors.js";
import type { RouteSpec } from "../../http/route-table.js";
import { isDraining } from "../../lifecycle/shutdown.js";

/** A database that has not answered in this long counts as unreachable (common practice: well under a load balancer's check interval). */
const DATABASE_TIMEOUT_MS = 2000;

async function databaseAnswers(ds: DataSource): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  try {
    return await Promise.race([
      ds.query("SELECT 1").then(() => true),
      new Promise<boolean>((resolve) => (timer = setTimeout(() => resolve(false), DATABASE_TIMEOUT_MS))),
    ]);
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}

/**
 * Readiness, for a load balancer: 200 while this instance can serve, 503 while it is shutting
 * down (lifecycle/shutdown.ts) or cannot reach the database. `/api/health` stays a liveness check
 * that touches nothing.
 */
export function readinessRoutes(ds: DataSource): RouteSpec[] {
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
          if (!(await databaseAnswers(ds)))
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
