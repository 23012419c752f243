import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from "typeorm";
import type { Role } from "../../auth/roles.js";
import { DATETIME } from "../../db/column-types.js";

@Entity({ name: "users" })
export class User {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("varchar", { length: 254, unique: true })
  email: string;

  @Column("varchar", { name: "display_name", length: 120 })
  displayName: string;

  @Column("varchar", { length: 16 })
  role: Role;

  @Column("varchar", { name: "password_hash", length: 100, select: false })
  passwordHash: string;

  @Column("boolean", { default: true })
  active: boolean;

  @Column(DATETIME, { name: "last_sign_in_at", nullable: true })
  lastSignInAt: Date | null;

  @CreateDateColumn({ name: "created_at", type: DATETIME })
  createdAt: Date;

  @UpdateDateColumn({ name: "updated_at", type: DATETIME })
  updatedAt: Date;
}

/** What the API ever sends about a user: never the hash. */
export interface PublicUser {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  active: boolean;
}

export function toPublicUser(u: User): PublicUser {
  return { id: u.id, email: u.email, displayName: u.displayName, role: u.role, active: u.active };
}
