import type { DataSource, EntityManager, QueryRunner } from "typeorm";

/**
 * Raw SQL for tests on either driver: parameters are named (`:id`) and TypeORM turns them into
 * the driver's own placeholders (`?` on SQLite, `$1` on PostgreSQL). Write portable SQL: `true`
 * and `false` for booleans, no SQLite or PostgreSQL functions; results of `count(*)` may be
 * strings (PostgreSQL's bigint), so read them through Number().
 */
export function sql<T = Record<string, unknown>>(
  db: DataSource | EntityManager | QueryRunner,
  text: string,
  params: Record<string, unknown> = {},
): Promise<T[]> {
  const source = "connection" in db ? db.connection : db;
  const [query, values] = source.driver.escapeQueryWithParameters(text, params);
  return db.query(query, values) as Promise<T[]>;
}
