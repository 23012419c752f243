import type { MigrationInterface, QueryRunner } from "typeorm";

export class CreateAuditEvents1764633600000 implements MigrationInterface {
  name = "CreateAuditEvents1764633600000";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "audit_events" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "at" datetime NOT NULL DEFAULT (datetime('now')),
      "actor_id" integer,
      "actor_email" varchar(254),
      "action" varchar(60) NOT NULL,
      "study_id" integer,
      "ip" varchar(64),
      "summary" text NOT NULL,
      "before" text,
      "after" text
    )`);
    for (const c of ["at", "actor_id", "action", "study_id"]) {
      await q.query(`CREATE INDEX "idx_audit_events_${c}" ON "audit_events" ("${c}")`);
    }
    // Append-only, enforced by the database as well as by the absence of any code path.
    await q.query(
      `CREATE TRIGGER "trg_audit_no_update" BEFORE UPDATE ON "audit_events" BEGIN SELECT RAISE(ABORT, 'audit events are append-only'); END`,
    );
    await q.query(
      `CREATE TRIGGER "trg_audit_no_delete" BEFORE DELETE ON "audit_events" BEGIN SELECT RAISE(ABORT, 'audit events are append-only'); END`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "audit_events"`);
  }
}
