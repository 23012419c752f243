import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from "typeorm";
import { DATETIME } from "../../db/column-types.js";

/** A message caught by the local fake SMTP server (demo and test mode only). */
@Entity({ name: "dev_mailbox" })
export class ReceivedMessage {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("varchar", { name: "to_address", length: 1000 })
  to: string;

  @Column("varchar", { name: "from_address", length: 254 })
  from: string;

  @Column("varchar", { length: 300 })
  subject: string;

  @Column("text")
  text: string;

  @Column("text")
  html: string;

  /** The Message-ID header as sent: a message sent twice shows up twice with the same id. */
  @Column("varchar", { name: "message_id", length: 300, nullable: true })
  messageId: string | null;

  @CreateDateColumn({ name: "received_at", type: DATETIME })
  receivedAt: Date;
}
