import { Column, Entity, Index, PrimaryColumn } from "typeorm";

/** One express-session record, kept in the app's own database so several API instances can share it. */
@Entity({ name: "sessions" })
export class Session {
  @PrimaryColumn("varchar", { length: 128 })
  sid: string;

  @Column("text")
  data: string;

  /** Epoch milliseconds; integer keeps the comparison portable across drivers. */
  @Index()
  @Column("bigint", { name: "expires_at" })
  expiresAt: number;

  @Index()
  @Column("integer", { name: "user_id", nullable: true })
  userId: number | null;
}
