import { Column, Entity, JoinColumn, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from "typeorm";
import { BLOB, DATETIME } from "../../db/column-types.js";
import { User } from "../users/user.entity.js";
import type { ExtractedGroups, ValidationReport } from "./extract-groups.js";

/** One uploaded version of a study's data. Rows are never updated: a new upload is a new version. */
@Entity({ name: "datasets" })
@Index(["studyId", "version"], { unique: true })
export class Dataset {
  @PrimaryGeneratedColumn("increment")
  id: number;

  @Column("integer", { name: "study_id" })
  studyId: number;

  @Column("integer")
  version: number;

  @Column("varchar", { name: "file_name", length: 255 })
  fileName: string;

  @Column("integer", { name: "size_bytes" })
  sizeBytes: number;

  /** SHA-256 of the uploaded file's bytes, hex. */
  @Column("varchar", { length: 64 })
  sha256: string;

  @Column("varchar", { name: "media_type", length: 100 })
  mediaType: string;

  @Column(BLOB, { select: false })
  content: Buffer;

  @Column("varchar", { length: 8 })
  layout: "long" | "wide";

  @Column("varchar", { name: "group_column", length: 200, nullable: true })
  groupColumn: string | null;

  @Column("varchar", { name: "outcome_column", length: 200, nullable: true })
  outcomeColumn: string | null;

  @Column("simple-json")
  report: ValidationReport;

  /** The values per group as decimal text (exactly as in the file), with their row numbers. */
  @Column("simple-json", { select: false })
  observations: ExtractedGroups;

  @Column("integer", { name: "uploaded_by_id" })
  uploadedById: number;

  @ManyToOne(() => User, { eager: true })
  @JoinColumn({ name: "uploaded_by_id" })
  uploadedBy: Relation<User>;

  /** Set in code to the millisecond, so it compares exactly with the plan's lock time. */
  @Column(DATETIME, { name: "uploaded_at" })
  uploadedAt: Date;
}
