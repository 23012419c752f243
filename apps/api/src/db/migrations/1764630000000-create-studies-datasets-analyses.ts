import type { MigrationInterface, QueryRunner } from "typeorm";

export class CreateStudiesDatasetsAnalyses1764630000000 implements MigrationInterface {
  name = "CreateStudiesDatasetsAnalyses1764630000000";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "studies" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "title" varchar(200) NOT NULL,
      "objective" text NOT NULL,
      "outcome_name" varchar(120) NOT NULL,
      "outcome_unit" varchar(40) NOT NULL,
      "factor_name" varchar(120) NOT NULL,
      "levels" text NOT NULL,
      "control_level" varchar(120),
      "alpha" real NOT NULL,
      "context" varchar(20) NOT NULL,
      "status" varchar(20) NOT NULL,
      "owner_id" integer NOT NULL REFERENCES "users" ("id"),
      "design" text NOT NULL,
      "plan" text NOT NULL,
      "plan_locked_at" datetime,
      "plan_locked_by_id" integer REFERENCES "users" ("id"),
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE INDEX "idx_studies_owner" ON "studies" ("owner_id")`);
    await q.query(`CREATE TABLE "datasets" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "study_id" integer NOT NULL REFERENCES "studies" ("id"),
      "version" integer NOT NULL,
      "file_name" varchar(255) NOT NULL,
      "size_bytes" integer NOT NULL,
      "sha256" varchar(64) NOT NULL,
      "media_type" varchar(100) NOT NULL,
      "content" blob NOT NULL,
      "layout" varchar(8) NOT NULL,
      "group_column" varchar(200),
      "outcome_column" varchar(200),
      "report" text NOT NULL,
      "observations" text NOT NULL,
      "uploaded_by_id" integer NOT NULL REFERENCES "users" ("id"),
      "uploaded_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_datasets_study_version" ON "datasets" ("study_id", "version")`);
    await q.query(`CREATE TABLE "analyses" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "study_id" integer NOT NULL REFERENCES "studies" ("id"),
      "dataset_id" integer NOT NULL REFERENCES "datasets" ("id"),
      "engine_version" varchar(20) NOT NULL,
      "recommended_test" varchar(20) NOT NULL,
      "chosen_test" varchar(20) NOT NULL,
      "posthoc_method" varchar(80) NOT NULL,
      "override_justification" text,
      "plan_snapshot" text NOT NULL,
      "result" text NOT NULL,
      "summary" text NOT NULL,
      "created_by_id" integer NOT NULL REFERENCES "users" ("id"),
      "created_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE INDEX "idx_analyses_study" ON "analyses" ("study_id")`);
    // Stored datasets and analyses are immutable: the database refuses edits, not only the code.
    for (const t of ["datasets", "analyses"]) {
      await q.query(
        `CREATE TRIGGER "trg_${t}_no_update" BEFORE UPDATE ON "${t}" BEGIN SELECT RAISE(ABORT, '${t} rows are immutable'); END`,
      );
    }
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "analyses"`);
    await q.query(`DROP TABLE "datasets"`);
    await q.query(`DROP TABLE "studies"`);
  }
}
