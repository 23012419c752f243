import type { DataSource, EntityManager } from "typeorm";

/**
 * Which database the data source talks to. SQLite is the embedded default; PostgreSQL is chosen by
 * DATABASE_URL. Code that needs driver-specific SQL (row claims with SKIP LOCKED, the in-process
 * transaction queue) asks here rather than reading the options itself.
 */
export function isPostgres(ds: DataSource | EntityManager): boolean {
  const source = "connection" in ds ? ds.connection : ds;
  return source.options.type === "postgres";
}
