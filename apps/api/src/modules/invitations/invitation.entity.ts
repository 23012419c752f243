import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  Index,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from "typeorm";
import type { Role } from "../../auth/roles.js";
import { DATETIME } from "../../db/column-types.js";
import { User } from "../users/user.entity.js";

/** An invitation by e-mail; only the SHA-256 of its single-use token is stored. */
@Entity({ name: "invitations" })
export class Invitation {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Index()
  @Column("varchar", { length: 254 })
  email: string;

  @Column("varchar", { length: 16 })
  role: Role;

  @Index({ unique: true })
  @Column("varchar", { name: "token_hash", length: 64 })
  tokenHash: string;

  @Column(DATETIME, { name: "expires_at" })
  expiresAt: Date;

  /** Null for an invitation made at the command line (`npm run invite-admin`). */
  @Column("integer", { name: "invited_by_id", nullable: true })
  invitedById: number | null;

  @ManyToOne(() => User, { eager: true, nullable: true })
  @JoinColumn({ name: "invited_by_id" })
  invitedBy: Relation<User> | null;

  @CreateDateColumn({ name: "created_at", type: DATETIME })
  createdAt: Date;

  @Column(DATETIME, { name: "used_at", nullable: true })
  usedAt: Date | null;

  @Column(DATETIME, { name: "revoked_at", nullable: true })
  revokedAt: Date | null;
}
