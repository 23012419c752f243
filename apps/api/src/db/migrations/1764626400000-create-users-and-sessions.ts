import type { MigrationInterface, QueryRunner } from "typeorm";

export class CreateUsersAndSessions1764626400000 implements MigrationInterface {
  name = "CreateUsersAndSessions1764626400000";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "users" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "email" varchar(254) NOT NULL UNIQUE,
      "display_name" varchar(120) NOT NULL,
      "role" varchar(16) NOT NULL CHECK ("role" IN ('analyst','reviewer','writer','admin')),
      "password_hash" varchar(100) NOT NULL,
      "active" boolean NOT NULL DEFAULT (1),
      "last_sign_in_at" datetime,
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "updated_at" datetime NOT NULL DEFAULT (datetime('now'))
    )`);
    await q.query(`CREATE TABLE "sessions" (
      "sid" varchar(128) PRIMARY KEY NOT NULL,
      "data" text NOT NULL,
      "expires_at" bigint NOT NULL,
      "user_id" integer
    )`);
    await q.query(`CREATE INDEX "idx_sessions_expires_at" ON "sessions" ("expires_at")`);
    await q.query(`CREATE INDEX "idx_sessions_user_id" ON "sessions" ("user_id")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "sessions"`);
    await q.query(`DROP TABLE "users"`);
  }
}
