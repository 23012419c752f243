import type { QueryRunner } from "typeorm";
import { isPostgres } from "../driver.js";

/** The same schema change written once per driver; a migration runs the list for its database. */
export interface DriverStatements {
  sqlite: string[];
  postgres: string[];
}

export async function runForDriver(q: QueryRunner, statements: DriverStatements): Promise<void> {
  for (const sql of isPostgres(q.connection) ? statements.postgres : statements.sqlite) await q.query(sql);
}

/**
 * PostgreSQL: a row trigger that refuses the change with the given message (SQLite's
 * `RAISE(ABORT, …)` triggers do the same there). The function is created by the first migration
 * that protects a table.
 */
export const PG_REFUSE_FUNCTION = `CREATE OR REPLACE FUNCTION "waymark_refuse_change"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '%', TG_ARGV[0] USING ERRCODE = 'restrict_violation';
END
$$`;

export const pgRefuse = (
  trigger: string,
  when: "UPDATE" | "DELETE" | "TRUNCATE",
  table: string,
  message: string,
) =>
  `CREATE TRIGGER "${trigger}" BEFORE ${when} ON "${table}" FOR EACH ${when === "TRUNCATE" ? "STATEMENT" : "ROW"} EXECUTE FUNCTION "waymark_refuse_change"('${message}')`;
