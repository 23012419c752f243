import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  type Relation,
} from "typeorm";
import { DATETIME, DOUBLE } from "../../db/column-types.js";
import { User } from "../users/user.entity.js";
import type { DesignAnswers } from "./design.js";
import type { PlanSettings } from "./plan.js";

import type { StudyContext, StudyStatus } from "@waymark/contract";

export type { StudyContext, StudyStatus };

@Entity({ name: "studies" })
export class Study {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("varchar", { length: 200 })
  title: string;

  @Column("text")
  objective: string;

  @Column("varchar", { name: "outcome_name", length: 120 })
  outcomeName: string;

  @Column("varchar", { name: "outcome_unit", length: 40 })
  outcomeUnit: string;

  @Column("varchar", { name: "factor_name", length: 120 })
  factorName: string;

  @Column("simple-json")
  levels: string[];

  @Column("varchar", { name: "control_level", length: 120, nullable: true })
  controlLevel: string | null;

  @Column(DOUBLE)
  alpha: number;

  @Column("varchar", { length: 20 })
  context: StudyContext;

  @Column("varchar", { length: 20 })
  status: StudyStatus;

  @Column("integer", { name: "owner_id" })
  ownerId: number;

  @ManyToOne(() => User, { eager: true })
  @JoinColumn({ name: "owner_id" })
  owner: Relation<User>;

  @Column("simple-json")
  design: DesignAnswers;

  @Column("simple-json")
  plan: PlanSettings;

  @Column(DATETIME, { name: "plan_locked_at", nullable: true })
  planLockedAt: Date | null;

  @Column("integer", { name: "plan_locked_by_id", nullable: true })
  planLockedById: number | null;

  @ManyToOne(() => User, { eager: true, nullable: true })
  @JoinColumn({ name: "plan_locked_by_id" })
  planLockedBy: Relation<User> | null;

  /** The data version analyses and submissions use; null means the newest upload. */
  @Column("integer", { name: "active_dataset_id", nullable: true })
  activeDatasetId: number | null;

  @CreateDateColumn({ name: "created_at", type: DATETIME })
  createdAt: Date;

  @UpdateDateColumn({ name: "updated_at", type: DATETIME })
  updatedAt: Date;
}
