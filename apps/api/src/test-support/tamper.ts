import type { DataSource } from "typeorm";
import { isPostgres } from "../db/driver.js";
import { sql } from "./sql.js";

/**
 * Simulates tampering with an immutable table: lifts the trigger that guards it for one statement
 * (`sql` with named parameters), then puts it back exactly as it was. SQLite drops and re-creates
 * the trigger from its stored definition; PostgreSQL disables and re-enables it.
 */
export async function tamper(
  ds: DataSource,
  table: string,
  trigger: string,
  statement: string,
  params: Record<string, unknown> = {},
): Promise<void> {
  if (isPostgres(ds)) {
    await ds.query(`ALTER TABLE "${table}" DISABLE TRIGGER "${trigger}"`);
    try {
      await sql(ds, statement, params);
    } finally {
      await ds.query(`ALTER TABLE "${table}" ENABLE TRIGGER "${trigger}"`);
    }
    return;
  }
  const [saved] = await sql<{ sql: string }>(
    ds,
    `SELECT sql FROM sqlite_master WHERE type = 'trigger' AND name = :trigger`,
    {
      trigger,
    },
  );
  if (!saved) throw new Error(`No trigger ${trigger}`);
  await ds.query(`DROP TRIGGER "${trigger}"`);
  try {
    await sql(ds, statement, params);
  } finally {
    await ds.query(saved.sql);
  }
}
