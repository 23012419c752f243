import { Column, Entity, Index, PrimaryColumn } from "typeorm";
import { DATETIME } from "../db/column-types.js";

/**
 * One throttle counter (sign-in per address or account, password re-entry per user). Written only
 * by the single-statement SQL in sign-in-throttle-store.ts; mapped here so the schema checks and
 * readers see the table like every other.
 */
@Entity({ name: "sign_in_throttle" })
export class SignInThrottleCounter {
  /** "ip:…", "account:…" or "reauth:<user id>"; long keys as a SHA-256. */
  @PrimaryColumn("varchar", { length: 300 })
  key: string;

  @Column("integer")
  hits: number;

  /** When the current window ends; a hit after it starts a new window at 1. */
  @Index("idx_sign_in_throttle_reset_at")
  @Column(DATETIME, { name: "reset_at" })
  resetAt: Date;
}
