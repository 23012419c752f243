import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DataSource } from "typeorm";
import { closeTestDatabase, openTestDatabase } from "../test-support/test-database.js";
import { sql } from "../test-support/sql.js";
import { isPostgres } from "./driver.js";

/**
 * The migrations build the same schema on SQLite and PostgreSQL: this file runs in both suites
 * and checks each database against the entities (every mapped column there, with the same
 * nullability) and against one list of indexes and guard triggers.
 */
let ds: DataSource;

beforeAll(async () => {
  ({ ds } = await openTestDatabase());
});
afterAll(async () => {
  await closeTestDatabase(ds);
});

interface ColumnInfo {
  name: string;
  nullable: boolean;
}

async function columnsOf(table: string): Promise<ColumnInfo[]> {
  if (isPostgres(ds))
    return (
      await sql<{ column_name: string; is_nullable: string }>(
        ds,
        `SELECT column_name, is_nullable FROM information_schema.columns WHERE table_schema = 'public' AND table_name = :table`,
        { table },
      )
    ).map((c) => ({ name: c.column_name, nullable: c.is_nullable === "YES" }));
  return (
    await sql<{ name: string; notnull: number; pk: number }>(
      ds,
      `SELECT name, "notnull", pk FROM pragma_table_info(:table)`,
      {
        table,
      },
    )
  ).map((c) => ({ name: c.name, nullable: c.notnull === 0 && c.pk === 0 }));
}

async function indexNames(): Promise<string[]> {
  const rows = isPostgres(ds)
    ? await sql<{ name: string }>(
        ds,
        `SELECT indexname AS name FROM pg_indexes WHERE schemaname = 'public' AND (indexname LIKE 'idx_%' OR indexname LIKE 'uq_%')`,
      )
    : await sql<{ name: string }>(
        ds,
        `SELECT name FROM sqlite_master WHERE type = 'index' AND (name LIKE 'idx_%' OR name LIKE 'uq_%')`,
      );
  return rows.map((r) => r.name).sort();
}

async function triggerNames(): Promise<string[]> {
  const rows = isPostgres(ds)
    ? await sql<{ name: string }>(
        ds,
        `SELECT tgname AS name FROM pg_trigger WHERE NOT tgisinternal AND tgname NOT LIKE '%truncate'`,
      )
    : await sql<{ name: string }>(ds, `SELECT name FROM sqlite_master WHERE type = 'trigger'`);
  return rows.map((r) => r.name).sort();
}

describe("the migrated schema (same on SQLite and PostgreSQL)", () => {
  it("holds every entity column with the entity's nullability", async () => {
    for (const entity of ds.entityMetadatas) {
      const actual = await columnsOf(entity.tableName);
      expect(actual.length, entity.tableName).toBeGreaterThan(0);
      for (const col of entity.columns) {
        const found = actual.find((c) => c.name === col.databaseName);
        expect(found, `${entity.tableName}.${col.databaseName}`).toBeDefined();
        if (!col.isPrimary)
          expect([col.databaseName, found!.nullable]).toEqual([col.databaseName, col.isNullable]);
      }
    }
  });

  // Named indexes only (idx_…, uq_…): each driver names the ones behind UNIQUE columns its own way.
  // A migration that adds an index adds its name here, and both suites then check it.
  it("has the same named indexes, immutability triggers and change-marker triggers", async () => {
    expect(await indexNames()).toEqual([
      "idx_analyses_study",
      "idx_analysis_runs_due",
      "idx_analysis_runs_study",
      "idx_audit_events_action",
      "idx_audit_events_actor_id",
      "idx_audit_events_at",
      "idx_audit_events_study_id",
      "idx_datasets_study_version",
      "idx_invitations_email",
      "idx_mail_outbox_due",
      "idx_mail_outbox_status",
      "idx_review_replies_comment",
      "idx_review_rounds_study_round",
      "idx_sessions_expires_at",
      "idx_sessions_user_id",
      "idx_sign_in_throttle_reset_at",
      "idx_studies_owner",
      "uq_analysis_runs_analysis",
    ]);
    // PostgreSQL adds statement triggers on TRUNCATE (refusing it, or moving the change marker);
    // SQLite has no TRUNCATE, so they are left out here.
    expect(await triggerNames()).toEqual([
      "trg_analyses_changed_delete",
      "trg_analyses_changed_insert",
      "trg_analyses_changed_update",
      "trg_analyses_no_update",
      "trg_audit_no_delete",
      "trg_audit_no_update",
      "trg_datasets_changed_delete",
      "trg_datasets_changed_insert",
      "trg_datasets_changed_update",
      "trg_datasets_no_update",
      "trg_review_comments_changed_delete",
      "trg_review_comments_changed_insert",
      "trg_review_comments_changed_update",
      "trg_review_replies_changed_delete",
      "trg_review_replies_changed_insert",
      "trg_review_replies_changed_update",
      "trg_review_rounds_changed_delete",
      "trg_review_rounds_changed_insert",
      "trg_review_rounds_changed_update",
      "trg_signatures_no_delete",
      "trg_signatures_no_update",
      "trg_studies_changed_delete",
      "trg_studies_changed_insert",
      "trg_studies_changed_update",
      "trg_users_changed_delete",
      "trg_users_changed_insert",
      "trg_users_changed_update",
    ]);
  });

  it("refuses a role outside the four (the same CHECK constraint)", async () => {
    await expect(
      sql(
        ds,
        `INSERT INTO users (email, display_name, role, password_hash) VALUES ('x@x.test', 'X', 'owner', 'x')`,
      ),
    ).rejects.toThrow(/CHECK|check constraint/i);
  });
});
