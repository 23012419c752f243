import { randomBytes } from "node:crypto";
import { DataSource } from "typeorm";
import { inject } from "vitest";
import { ENTITY_DRIVER } from "../db/column-types.js";
import { openDatabase } from "../db/data-source.js";

/** The template database the global set-up migrated once; each test database is copied from it. */
export const PG_TEMPLATE = "waymark_template";

/** `url` with its database name replaced. */
export function withDatabase(url: string, name: string): string {
  const u = new URL(url);
  u.pathname = `/${name}`;
  return u.toString();
}

const admins = new Map<string, Promise<DataSource>>();

/**
 * Runs one statement (CREATE/DROP DATABASE) on the cluster's maintenance database, through one
 * small connection pool per test process that lives as long as the process.
 */
export async function adminQuery(adminUrl: string, sql: string): Promise<void> {
  let admin = admins.get(adminUrl);
  if (!admin) {
    admin = new DataSource({ type: "postgres", url: adminUrl, entities: [], poolSize: 2 }).initialize();
    admins.set(adminUrl, admin);
  }
  await (await admin).query(sql);
}

/** Closes the maintenance pools (the global set-up's, before it stops the cluster). */
export async function closeAdmin(): Promise<void> {
  for (const admin of admins.values()) await (await admin).destroy();
  admins.clear();
}

const created = new Map<DataSource, string>();

/**
 * A fresh, migrated, empty database for one test app: SQLite in memory, or on PostgreSQL
 * (WAYMARK_TEST_DB=postgres) a new database copied from the migrated template, which takes
 * milliseconds where running the migrations would take a second.
 */
export async function openTestDatabase(): Promise<{ ds: DataSource; url: string | null }> {
  if (ENTITY_DRIVER !== "postgres") return { ds: await openDatabase(":memory:"), url: null };
  const adminUrl = inject("pgAdminUrl");
  const name = `waymark_test_${randomBytes(6).toString("hex")}`;
  await adminQuery(adminUrl, `CREATE DATABASE "${name}" TEMPLATE "${PG_TEMPLATE}" STRATEGY FILE_COPY`);
  const url = withDatabase(adminUrl, name);
  // A small pool: many test apps share one cluster, and tests make few concurrent requests.
  const ds = await openDatabase({ driver: "postgres", url, poolSize: 4, statementTimeoutMs: 60_000 });
  created.set(ds, name);
  return { ds, url };
}

/** Closes a test database and, on PostgreSQL, drops it. */
export async function closeTestDatabase(ds: DataSource): Promise<void> {
  if (ds.isInitialized) await ds.destroy();
  const name = created.get(ds);
  if (!name) return;
  created.delete(ds);
  await adminQuery(inject("pgAdminUrl"), `DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
}

declare module "vitest" {
  export interface ProvidedContext {
    /** The throwaway cluster's maintenance database, when the tests run on PostgreSQL. */
    pgAdminUrl: string;
  }
}
