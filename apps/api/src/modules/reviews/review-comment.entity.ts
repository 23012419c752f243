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

import type { ReviewStep } from "@waymark/contract";

export { REVIEW_STEPS, type ReviewStep } from "@waymark/contract";

@Entity({ name: "review_comments" })
export class ReviewComment {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("integer", { name: "round_id" })
  roundId: number;

  /** The step of the study the comment is about, or null for the study as a whole. */
  @Column("varchar", { length: 20, nullable: true })
  step: ReviewStep | null;

  @Column("text")
  body: string;

  @Column("integer", { name: "author_id" })
  authorId: number;

  @ManyToOne(() => User, { eager: true })
  @JoinColumn({ name: "author_id" })
  author: Relation<User>;

  @CreateDateColumn({ name: "created_at", type: DATETIME })
  createdAt: Date;
}
