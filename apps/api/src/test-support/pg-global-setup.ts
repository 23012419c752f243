import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import type { TestProject } from "vitest/node";
import { processDatabaseDriver } from "../config/env.js";
import { openDatabase } from "../db/data-source.js";
import { adminQuery, closeAdmin, PG_TEMPLATE, withDatabase } from "./test-database.js";

const clusterScript = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  "../../../../scripts/pg-cluster.mjs",
);

interface Cluster {
  url: string;
  stop: () => void;
}

/**
 * Vitest global set-up. With WAYMARK_TEST_DB=postgres it starts a throwaway PostgreSQL cluster
 * (scripts/pg-cluster.mjs), migrates a template database once, and hands the tests the cluster's
 * address; each test app then copies the template (test-database.ts). The cluster is stopped and
 * its folder removed at the end. On SQLite it does nothing.
 */
export default async function setup(project: TestProject): Promise<(() => void) | undefined> {
  if (processDatabaseDriver() !== "postgres") return undefined;
  const { startCluster } = (await import(pathToFileURL(clusterScript).href)) as {
    startCluster: () => Promise<Cluster>;
  };
  const cluster = await startCluster();
  try {
    await adminQuery(cluster.url, `CREATE DATABASE "${PG_TEMPLATE}"`);
    const ds = await openDatabase(withDatabase(cluster.url, PG_TEMPLATE));
    await ds.destroy();
    await closeAdmin();
  } catch (e) {
    cluster.stop();
    throw e;
  }
  project.provide("pgAdminUrl", cluster.url);
  return () => cluster.stop();
}
