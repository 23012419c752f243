import type { DataSource, EntityManager, QueryRunner } from "typeorm";
import { runSql } from "../db/run-sql.js";

/**
 * Raw SQL for tests on either driver, through the app's own `runSql` (named parameters such as
 * `:id` become `?` on SQLite and `$1` on PostgreSQL). Write portable SQL: `true` and `false` for
 * booleans, no SQLite or PostgreSQL functions; results of `count(*)` may be strings (PostgreSQL's
 * bigint), so read them through Number(). Answers the rows (SELECT, or RETURNING).
 */
export async function sql<T = Record<string, unknown>>(
  db: DataSource | EntityManager | QueryRunner,
  text: string,
  params: Record<string, unknown> = {},
): Promise<T[]> {
  // A query runner's own manager keeps the statement on its connection (inside its transaction).
  const target: DataSource | EntityManager = "driver" in db ? db : "manager" in db ? db.manager : db;
  return (await runSql<T>(target, text, params)).rows;
}
