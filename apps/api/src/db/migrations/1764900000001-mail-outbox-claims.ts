import { TableColumn, TableIndex, type MigrationInterface, type QueryRunner } from "typeorm";
import { isPostgres } from "../driver.js";

/** The driver's datetime type (the entities' `DATETIME`), asked of the connection being migrated. */
const datetime = (q: QueryRunner) => (isPostgres(q.connection) ? "timestamp with time zone" : "datetime");

/**
 * Outbox messages are claimed by one API instance at a time: `claimed_by` names the instance and
 * `lease_until` says when another may take the message over (its claimant presumed dead). The
 * dev mailbox keeps each caught message's Message-ID, so a re-sent message is recognisable.
 */
export class MailOutboxClaims1764900000001 implements MigrationInterface {
  name = "MailOutboxClaims1764900000001";

  async up(q: QueryRunner): Promise<void> {
    await q.addColumns("mail_outbox", [
      new TableColumn({ name: "claimed_by", type: "varchar", length: "100", isNullable: true }),
      new TableColumn({ name: "lease_until", type: datetime(q), isNullable: true }),
    ]);
    await q.createIndex(
      "mail_outbox",
      new TableIndex({ name: "idx_mail_outbox_due", columnNames: ["status", "next_attempt_at"] }),
    );
    await q.addColumn(
      "dev_mailbox",
      new TableColumn({ name: "message_id", type: "varchar", length: "300", isNullable: true }),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.dropColumn("dev_mailbox", "message_id");
    await q.dropIndex("mail_outbox", "idx_mail_outbox_due");
    await q.dropColumns("mail_outbox", ["claimed_by", "lease_until"]);
  }
}
