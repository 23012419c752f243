import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from "typeorm";
import { DATETIME } from "../../db/column-types.js";

/**
 * An electronic signature of approval: who signed, when, what the signature means, and a hash
 * of exactly what was approved. Never updated or deleted (database triggers refuse it).
 */
@Entity({ name: "signatures" })
export class Signature {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("integer", { name: "study_id" })
  studyId: number;

  @Column("integer", { name: "round_id" })
  roundId: number;

  @Column("integer", { name: "signer_id" })
  signerId: number;

  /** The signer's name and e-mail as they were at signing time. */
  @Column("varchar", { name: "signer_name", length: 120 })
  signerName: string;

  @Column("varchar", { name: "signer_email", length: 254 })
  signerEmail: string;

  @Column("varchar", { length: 300 })
  meaning: string;

  /** SHA-256 of the canonical JSON of the approved study, plan, dataset and analysis. */
  @Column("varchar", { name: "content_hash", length: 64 })
  contentHash: string;

  @CreateDateColumn({ name: "signed_at", type: DATETIME })
  signedAt: Date;
}
