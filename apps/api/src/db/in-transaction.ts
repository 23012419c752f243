import type { DataSource, EntityManager } from "typeorm";
import { isPostgres } from "./driver.js";

const queues = new WeakMap<DataSource, Promise<unknown>>();

/**
 * Runs `work` in a database transaction.
 *
 * SQLite: one transaction at a time per data source. better-sqlite3 gives TypeORM a single
 * connection, so two overlapping `ds.transaction` calls would both issue BEGIN on it ("cannot
 * start a transaction within a transaction", seen under load). Queuing them in the process keeps
 * each one whole; SQLite has one writer anyway.
 *
 * PostgreSQL: each transaction takes its own pooled connection (READ COMMITTED), so no queue —
 * which would not span instances anyway. A transaction that re-checks a row's state locks that
 * row first (`lockRowForWrite`), so concurrent writers, in this process or another, take turns.
 */
export function inTransaction<T>(ds: DataSource, work: (tx: EntityManager) => Promise<T>): Promise<T> {
  if (isPostgres(ds)) return ds.transaction(work);
  const previous = queues.get(ds) ?? Promise.resolve();
  const run = previous.then(
    () => ds.transaction(work),
    () => ds.transaction(work),
  );
  // The queue continues whether this transaction commits or fails.
  queues.set(
    ds,
    run.catch(() => undefined),
  );
  return run;
}
