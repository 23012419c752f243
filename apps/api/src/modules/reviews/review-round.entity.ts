import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from "typeorm";
import { DATETIME } from "../../db/column-types.js";
import { User } from "../users/user.entity.js";

export type ReviewDecision = "approved" | "changes_requested";

/** One submission of a study for review and the reviewer's decision on it; rounds are kept. */
@Entity({ name: "review_rounds" })
export class ReviewRound {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("integer", { name: "study_id" })
  studyId: number;

  @Column("integer")
  round: number;

  /** The analysis and dataset version frozen by the submission. */
  @Column("integer", { name: "analysis_id" })
  analysisId: number;

  @Column("integer", { name: "dataset_id" })
  datasetId: number;

  @Column("integer", { name: "submitted_by_id" })
  submittedById: number;

  @ManyToOne(() => User, { eager: true })
  @JoinColumn({ name: "submitted_by_id" })
  submittedBy: Relation<User>;

  @CreateDateColumn({ name: "submitted_at", type: DATETIME })
  submittedAt: Date;

  @Column("varchar", { length: 20, nullable: true })
  decision: ReviewDecision | null;

  @Column("integer", { name: "decided_by_id", nullable: true })
  decidedById: number | null;

  @ManyToOne(() => User, { eager: true, nullable: true })
  @JoinColumn({ name: "decided_by_id" })
  decidedBy: Relation<User> | null;

  @Column(DATETIME, { name: "decided_at", nullable: true })
  decidedAt: Date | null;
}
