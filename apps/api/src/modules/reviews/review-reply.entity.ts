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

/** The analyst's answer to one reviewer comment; kept with the round, never edited. */
@Entity({ name: "review_replies" })
export class ReviewReply {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("integer", { name: "comment_id" })
  commentId: number;

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
