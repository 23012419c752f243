import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from "typeorm";
import type { AnalysisResult, OmnibusTest, PosthocFamily } from "@waymark/stats";
import { DATETIME } from "../../db/column-types.js";
import { User } from "../users/user.entity.js";

/** A stored run of the locked plan on one dataset version by one engine version. Never updated. */
@Entity({ name: "analyses" })
export class Analysis {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("integer", { name: "study_id" })
  studyId: number;

  @Column("integer", { name: "dataset_id" })
  datasetId: number;

  @Column("varchar", { name: "engine_version", length: 20 })
  engineVersion: string;

  @Column("varchar", { name: "recommended_test", length: 20 })
  recommendedTest: OmnibusTest;

  @Column("varchar", { name: "chosen_test", length: 20 })
  chosenTest: OmnibusTest;

  @Column("varchar", { name: "posthoc_method", length: 80 })
  /** The post-hoc family's id (vocabulary ids; older rows converted by migration 1764900000000). */
  posthocMethod: PosthocFamily;

  @Column("text", { name: "override_justification", nullable: true })
  overrideJustification: string | null;

  /** The plan as it was locked, copied so the analysis stands on its own. */
  @Column("simple-json", { name: "plan_snapshot" })
  planSnapshot: unknown;

  @Column("simple-json")
  result: AnalysisResult;

  @Column("simple-json")
  summary: string[];

  @Column("integer", { name: "created_by_id" })
  createdById: number;

  @ManyToOne(() => User, { eager: true })
  @JoinColumn({ name: "created_by_id" })
  createdBy: Relation<User>;

  @CreateDateColumn({ name: "created_at", type: DATETIME })
  createdAt: Date;
}
