import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import { DATETIME } from "../../db/column-types.js";

export type OutboxStatus = "pending" | "sent" | "failed";

/** A message waiting to be sent, or the record of having sent it. Kept in the database so any API instance can send it. */
@Entity({ name: "mail_outbox" })
@Index("idx_mail_outbox_due", ["status", "nextAttemptAt"])
export class OutboxMessage {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("varchar", { name: "to_address", length: 254 })
  to: string;

  @Column("varchar", { length: 300 })
  subject: string;

  @Column("text")
  text: string;

  @Column("text")
  html: string;

  @Index("idx_mail_outbox_status")
  @Column("varchar", { length: 10 })
  status: OutboxStatus;

  @Column("integer")
  attempts: number;

  @Column(DATETIME, { name: "next_attempt_at" })
  nextAttemptAt: Date;

  @Column("text", { name: "last_error", nullable: true })
  lastError: string | null;

  @CreateDateColumn({ name: "created_at", type: DATETIME })
  createdAt: Date;

  @Column(DATETIME, { name: "sent_at", nullable: true })
  sentAt: Date | null;

  /** The instance sending (or that sent) the message; see mail-dispatcher.ts. */
  @Column("varchar", { name: "claimed_by", length: 100, nullable: true })
  claimedBy: string | null;

  /** Until when the claim holds; past it, another instance may take the message over. */
  @Column(DATETIME, { name: "lease_until", nullable: true })
  leaseUntil: Date | null;
}
