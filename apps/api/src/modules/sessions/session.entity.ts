import { Column, Entity, Index, PrimaryColumn } from "typeorm";
import { BIGINT_AS_NUMBER } from "../../db/column-types.js";

/** One express-session record, kept in the app's own database so several API instances can share it. */
@Entity({ name: "sessions" })
export class Session {
  @PrimaryColumn("varchar", { length: 128 })
  sid: string;

  @Column("text")
  data: string;

  /** Epoch milliseconds; integer keeps the comparison portable across drivers. */
  @Index()
  @Column("bigint", { name: "expires_at", transformer: BIGINT_AS_NUMBER })
  expiresAt: number;

  @Index()
  @Column("integer", { name: "user_id", nullable: true })
  userId: number | null;
}
