import type { MigrationInterface, QueryRunner } from "typeorm";

export class CreateReviewMailPeople1764637200000 implements MigrationInterface {
  name = "CreateReviewMailPeople1764637200000";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "review_rounds" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "study_id" integer NOT NULL REFERENCES "studies" ("id"),
      "round" integer NOT NULL,
      "analysis_id" integer NOT NULL REFERENCES "analyses" ("id"),
      "dataset_id" integer NOT NULL REFERENCES "datasets" ("id"),
      "submitted_by_id" integer NOT NULL REFERENCES "users" ("id"),
      "submitted_at" datetime NOT NULL DEFAULT (datetime('now')),
      "decision" varchar(20),
      "decided_by_id" integer REFERENCES "users" ("id"),
      "decided_at" datetime
    )`);
    await q.query(
      `CREATE UNIQUE INDEX "idx_review_rounds_study_round" ON "review_rounds" ("study_id", "round")`,
    );
    await q.query(`CREATE TABLE "review_comments" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "round_id" integer NOT NULL REFERENCES "review_rounds" ("id"),
      "step" varchar(20),
      "body" text NOT NULL,
      "author_id" integer NOT NULL REFERENCES "users" ("id"),
      "created_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "signatures" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "study_id" integer NOT NULL REFERENCES "studies" ("id"),
      "round_id" integer NOT NULL REFERENCES "review_rounds" ("id"),
      "signer_id" integer NOT NULL REFERENCES "users" ("id"),
      "signer_name" varchar(120) NOT NULL,
      "signer_email" varchar(254) NOT NULL,
      "meaning" varchar(300) NOT NULL,
      "content_hash" varchar(64) NOT NULL,
      "signed_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(
      `CREATE TRIGGER "trg_signatures_no_update" BEFORE UPDATE ON "signatures" BEGIN SELECT RAISE(ABORT, 'signatures are immutable'); END`,
    );
    await q.query(
      `CREATE TRIGGER "trg_signatures_no_delete" BEFORE DELETE ON "signatures" BEGIN SELECT RAISE(ABORT, 'signatures are immutable'); END`,
    );
    await q.query(`CREATE TABLE "mail_outbox" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "to_address" varchar(254) NOT NULL,
      "subject" varchar(300) NOT NULL,
      "text" text NOT NULL,
      "html" text NOT NULL,
      "status" varchar(10) NOT NULL,
      "attempts" integer NOT NULL DEFAULT (0),
      "next_attempt_at" datetime NOT NULL,
      "last_error" text,
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "sent_at" datetime
    )`);
    await q.query(`CREATE INDEX "idx_mail_outbox_status" ON "mail_outbox" ("status")`);
    await q.query(`CREATE TABLE "dev_mailbox" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "to_address" varchar(1000) NOT NULL,
      "from_address" varchar(254) NOT NULL,
      "subject" varchar(300) NOT NULL,
      "text" text NOT NULL,
      "html" text NOT NULL,
      "received_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "invitations" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "email" varchar(254) NOT NULL,
      "role" varchar(16) NOT NULL,
      "token_hash" varchar(64) NOT NULL UNIQUE,
      "expires_at" datetime NOT NULL,
      "invited_by_id" integer NOT NULL REFERENCES "users" ("id"),
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "used_at" datetime,
      "revoked_at" datetime
    )`);
    await q.query(`CREATE INDEX "idx_invitations_email" ON "invitations" ("email")`);
    await q.query(`CREATE TABLE "organization_settings" (
      "id" integer PRIMARY KEY NOT NULL,
      "policy" varchar(20) NOT NULL,
      "default_alpha" real NOT NULL,
      "default_adjust" varchar(12) NOT NULL,
      "paper_size" varchar(8) NOT NULL,
      "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(
      `INSERT INTO "organization_settings" ("id", "policy", "default_alpha", "default_adjust", "paper_size") VALUES (1, 'classic-first', 0.05, 'holm', 'A4')`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of [
      "organization_settings",
      "invitations",
      "dev_mailbox",
      "mail_outbox",
      "signatures",
      "review_comments",
      "review_rounds",
    ])
      await q.query(`DROP TABLE "${t}"`);
  }
}
