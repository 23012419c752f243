import type { DataSource, EntityManager } from "typeorm";

/**
 * Runs one SQL statement written with named parameters (`:name`) on either driver: TypeORM's
 * driver turns them into `?` (SQLite) or `$1` (PostgreSQL) and converts dates to each one's
 * format. The answer is the same shape on both — rows (from SELECT or RETURNING) and the number
 * of rows changed — where `ds.query` alone answers differently per driver and statement.
 */
export async function runSql<Row = Record<string, unknown>>(
  ds: DataSource | EntityManager,
  sql: string,
  params: Record<string, unknown> = {},
): Promise<{ rows: Row[]; affected: number }> {
  const source = "connection" in ds ? ds.connection : ds;
  const [text, values] = source.driver.escapeQueryWithParameters(sql, params);
  // Inside a transaction, its own runner; otherwise one borrowed for this statement.
  const own = "connection" in ds ? ds.queryRunner : undefined;
  const runner = own ?? source.createQueryRunner();
  let result;
  try {
    result = await runner.query(text, values, true);
  } finally {
    if (!own) await runner.release();
  }
  const rows = (Array.isArray(result.records) ? result.records : []) as Row[];
  return { rows, affected: typeof result.affected === "number" ? result.affected : rows.length };
}

/** A datetime from a raw row: a Date on PostgreSQL, UTC text ("2026-12-02 06:44:22.123") on SQLite. */
export function readDate(value: unknown): Date {
  if (value instanceof Date) return value;
  const text = String(value);
  return new Date(/[zZ]|[+-]\d\d:?\d\d$/.test(text) ? text : `${text.replace(" ", "T")}Z`);
}
