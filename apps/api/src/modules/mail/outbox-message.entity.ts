import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import { DATETIME } from "../../db/column-types.js";

export type OutboxStatus = "pending" | "sent" | "failed";

/** A message waiting to be sent, or the record of having sent it. Kept in the database so any API instance can send it. */
@Entity({ name: "mail_outbox" })
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

  @Index()
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
}
