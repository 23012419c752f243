import type { MigrationInterface, QueryRunner } from "typeorm";
import { runForDriver } from "./by-driver.js";

/** The invitations table as first created, with `invited_by_id` nullable or not. */
const sqliteTable = (name: string, invitedBy: string) => `CREATE TABLE "${name}" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "email" varchar(254) NOT NULL,
      "role" varchar(16) NOT NULL,
      "token_hash" varchar(64) NOT NULL UNIQUE,
      "expires_at" datetime NOT NULL,
      "invited_by_id" integer ${invitedBy} REFERENCES "users" ("id"),
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "used_at" datetime,
      "revoked_at" datetime
    )`;

/** SQLite cannot drop NOT NULL in place: the table is rebuilt, rows and ids kept. */
const sqliteRebuild = (invitedBy: string) => [
  sqliteTable("invitations_rebuilt", invitedBy),
  `INSERT INTO "invitations_rebuilt" SELECT "id", "email", "role", "token_hash", "expires_at", "invited_by_id", "created_at", "used_at", "revoked_at" FROM "invitations"`,
  `DROP TABLE "invitations"`,
  `ALTER TABLE "invitations_rebuilt" RENAME TO "invitations"`,
  `CREATE INDEX "idx_invitations_email" ON "invitations" ("email")`,
];

/**
 * An invitation made at the command line (`npm run invite-admin`, the first admin of a new
 * database) has no inviting account: `invited_by_id` becomes nullable.
 */
export class InvitationsFromCommandLine1764950000000 implements MigrationInterface {
  name = "InvitationsFromCommandLine1764950000000";

  async up(q: QueryRunner): Promise<void> {
    await runForDriver(q, {
      sqlite: sqliteRebuild(""),
      postgres: [`ALTER TABLE "invitations" ALTER COLUMN "invited_by_id" DROP NOT NULL`],
    });
  }

  async down(q: QueryRunner): Promise<void> {
    // Command-line invitations have no inviter to restore; they go with the column's constraint.
    await q.query(`DELETE FROM "invitations" WHERE "invited_by_id" IS NULL`);
    await runForDriver(q, {
      sqlite: sqliteRebuild("NOT NULL"),
      postgres: [`ALTER TABLE "invitations" ALTER COLUMN "invited_by_id" SET NOT NULL`],
    });
  }
}
