import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import { DATETIME } from "../../db/column-types.js";

/**
 * One line of the audit trail. Append-only: no code path updates or deletes these rows, and
 * database triggers refuse it too.
 */
@Entity({ name: "audit_events" })
export class AuditEvent {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Index()
  @CreateDateColumn({ type: DATETIME })
  at: Date;

  @Index()
  @Column("integer", { name: "actor_id", nullable: true })
  actorId: number | null;

  /** Kept as text so the trail still reads after an account changes. */
  @Column("varchar", { name: "actor_email", length: 254, nullable: true })
  actorEmail: string | null;

  @Index()
  @Column("varchar", { length: 60 })
  action: string;

  @Index()
  @Column("integer", { name: "study_id", nullable: true })
  studyId: number | null;

  @Column("varchar", { length: 64, nullable: true })
  ip: string | null;

  @Column("text")
  summary: string;

  @Column("simple-json", { nullable: true })
  before: Record<string, unknown> | null;

  @Column("simple-json", { nullable: true })
  after: Record<string, unknown> | null;
}
