import type { DataSource, EntityManager } from "typeorm";

/**
 * Runs independent reads: at once on a data source (on PostgreSQL each takes its own pooled
 * connection), one after another on a transaction's manager, which holds one connection (pg
 * warns about overlapping queries on one client and will refuse them in pg 9).
 */
export async function readAll<T extends unknown[]>(
  db: DataSource | EntityManager,
  ...reads: { [K in keyof T]: () => Promise<T[K]> }
): Promise<T> {
  const bound = "queryRunner" in db && db.queryRunner !== undefined;
  if (!bound) return (await Promise.all(reads.map((read) => read()))) as T;
  const out: unknown[] = [];
  for (const read of reads) out.push(await read());
  return out as T;
}
