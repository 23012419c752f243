import { Column, Entity, PrimaryColumn, UpdateDateColumn } from "typeorm";
import { DATETIME } from "../../db/column-types.js";

/** The organization's single settings row (id 1). */
@Entity({ name: "organization_settings" })
export class OrganizationSettings {
  @PrimaryColumn("integer")
  id: number;

  @Column("varchar", { length: 20 })
  policy: "classic-first" | "welch-first";

  @Column("real", { name: "default_alpha" })
  defaultAlpha: number;

  @Column("varchar", { name: "default_adjust", length: 12 })
  defaultAdjust: "holm" | "bonferroni" | "bh";

  @Column("varchar", { name: "paper_size", length: 8 })
  paperSize: "A4" | "Letter";

  @UpdateDateColumn({ name: "updated_at", type: DATETIME })
  updatedAt: Date;
}
