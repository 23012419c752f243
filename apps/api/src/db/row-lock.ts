import type { DataSource, EntityManager } from "typeorm";
import { isPostgres } from "./driver.js";

/**
 * Inside a transaction on PostgreSQL, takes the row's write lock (`SELECT … FOR UPDATE`) so the
 * state a transaction checks cannot change under it before it commits: a second writer on the
 * same row waits, then reads what the first committed. On SQLite there is nothing to do: one
 * writer at a time, and `inTransaction` queues the process's transactions.
 */
export async function lockRowForWrite(
  db: DataSource | EntityManager,
  table: string,
  id: number,
): Promise<void> {
  if (!isPostgres(db)) return;
  const runner = "queryRunner" in db ? db.queryRunner : undefined;
  if (!runner?.isTransactionActive) return;
  await db.query(`SELECT 1 FROM "${table}" WHERE "id" = $1 FOR UPDATE`, [id]);
}
